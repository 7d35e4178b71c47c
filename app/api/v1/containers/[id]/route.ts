import { route } from '@/server/http/route';
import { idParamSchema } from '@/lib/contracts/common';
import { updateContainerSchema } from '@/lib/contracts/containers';
import { updateContainer } from '@/server/services/containers/update-container';

export const PATCH = route({ access: 'bins.edit', params: idParamSchema, body: updateContainerSchema }, async ({ params, body }) => ({
  container: await updateContainer({ containerId: params.id, input: body }),
}));
