import { route } from '@/server/http/route';
import { idParamSchema } from '@/lib/contracts/common';
import { updatePartSchema } from '@/lib/contracts/parts';
import { getPart } from '@/server/services/parts/list-parts';
import { updatePart } from '@/server/services/parts/update-part';

export const GET = route({ access: 'catalog.read', params: idParamSchema }, async ({ params }) => ({ part: await getPart({ partId: params.id }) }));

export const PATCH = route({ access: 'parts.edit', params: idParamSchema, body: updatePartSchema }, async ({ params, body }) => ({
  part: await updatePart({ partId: params.id, input: body }),
}));
