import { route } from '@/server/http/route';
import { idParamSchema } from '@/lib/contracts/common';
import { updateScaleSchema } from '@/lib/contracts/scales';
import { getScale } from '@/server/services/scales/list-scales';
import { updateScale } from '@/server/services/scales/update-scale';

export const GET = route({ access: 'catalog.read', params: idParamSchema }, async ({ params }) => ({ scale: await getScale({ scaleId: params.id }) }));

export const PATCH = route({ access: 'admin.manage', params: idParamSchema, body: updateScaleSchema }, async ({ params, body }) => ({
  scale: await updateScale({ scaleId: params.id, input: body }),
}));
