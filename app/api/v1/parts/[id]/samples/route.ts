import { created, route } from '@/server/http/route';
import { idParamSchema } from '@/lib/contracts/common';
import { recordSampleSchema } from '@/lib/contracts/parts';
import { listSamples } from '@/server/services/parts/list-samples';
import { recordSample } from '@/server/services/parts/record-sample';

export const GET = route({ access: 'catalog.read', params: idParamSchema }, async ({ params }) => ({ samples: await listSamples({ partId: params.id }) }));

export const POST = route({ access: 'counts.capture', params: idParamSchema, body: recordSampleSchema }, async ({ params, body, user }) =>
  created(await recordSample({ partId: params.id, input: body, by: user })),
);
