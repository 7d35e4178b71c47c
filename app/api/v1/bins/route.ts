import { created, route } from '@/server/http/route';
import { createBinSchema, listBinsSchema } from '@/server/schemas/bins';
import { createBin } from '@/server/services/bins/create-bin';
import { listBins } from '@/server/services/bins/list-bins';

export const GET = route({ access: 'catalog.read', query: listBinsSchema }, async ({ query }) => ({ bins: await listBins(query) }));

export const POST = route({ access: 'bins.edit', body: createBinSchema }, async ({ body, user }) => created({ bin: await createBin({ input: body, by: user }) }));
