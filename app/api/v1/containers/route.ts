import { created, route } from '@/server/http/route';
import { createContainerSchema } from '@/lib/contracts/containers';
import { createContainer } from '@/server/services/containers/create-container';
import { listContainers } from '@/server/services/containers/list-containers';

export const GET = route({ access: 'catalog.read' }, async () => ({ containers: await listContainers() }));

export const POST = route({ access: 'bins.edit', body: createContainerSchema }, async ({ body }) =>
  created({ container: await createContainer({ input: body }) }),
);
