import { route } from '@/server/http/route';
import { idParamSchema } from '@/lib/contracts/common';
import { updateKitSchema } from '@/lib/contracts/kits';
import { getKit } from '@/server/services/kits/list-kits';
import { updateKit } from '@/server/services/kits/update-kit';

export const GET = route({ access: 'catalog.read', params: idParamSchema }, async ({ params }) => ({ kit: await getKit({ kitId: params.id }) }));

export const PATCH = route({ access: 'kits.edit', params: idParamSchema, body: updateKitSchema }, async ({ params, body }) => ({
  kit: await updateKit({ kitId: params.id, input: body }),
}));
