import { route } from '@/server/http/route';
import { idParamSchema } from '@/server/schemas/common';
import { updateContainerSchema } from '@/server/schemas/containers';
import { updateContainer } from '@/server/services/containers/update-container';

export const PATCH = route({ access: 'bins.edit', params: idParamSchema, body: updateContainerSchema }, async ({ params, body }) => ({
  container: await updateContainer({ containerId: params.id, input: body }),
}));
