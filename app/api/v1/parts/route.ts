import { created, route } from '@/server/http/route';
import { createPartSchema, listPartsSchema } from '@/lib/contracts/parts';
import { createPart } from '@/server/services/parts/create-part';
import { listParts } from '@/server/services/parts/list-parts';

export const GET = route({ access: 'catalog.read', query: listPartsSchema }, async ({ query }) => listParts(query));

export const POST = route({ access: 'parts.edit', body: createPartSchema }, async ({ body }) => created({ part: await createPart({ input: body }) }));
