import { created, route } from '@/server/http/route';
import { idParamSchema } from '@/lib/contracts/common';
import { copyKitSchema } from '@/lib/contracts/kits';
import { copyKitRevision } from '@/server/services/kits/copy-kit-revision';

export const POST = route({ access: 'kits.edit', params: idParamSchema, body: copyKitSchema }, async ({ params, body }) =>
  created({ kit: await copyKitRevision({ kitId: params.id, revision: body.revision }) }),
);
