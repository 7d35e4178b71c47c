import { created, route } from '@/server/http/route';
import { createScaleSchema } from '@/lib/contracts/scales';
import { createScale } from '@/server/services/scales/create-scale';
import { listScales } from '@/server/services/scales/list-scales';

export const GET = route({ access: 'catalog.read' }, async () => ({ scales: await listScales() }));

export const POST = route({ access: 'admin.manage', body: createScaleSchema }, async ({ body }) => created({ scale: await createScale({ input: body }) }));
