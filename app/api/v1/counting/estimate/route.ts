import { route } from '@/server/http/route';
import { estimateSchema } from '@/lib/contracts/estimate';
import { previewCount } from '@/server/services/counting/estimate-count';

export const POST = route({ access: 'signed-in', body: estimateSchema }, async ({ body }) => previewCount({ input: body }));
