import { route } from '@/server/http/route';
import { sampleDecisionParamsSchema, sampleDecisionSchema } from '@/lib/contracts/parts';
import { decideSample } from '@/server/services/parts/decide-sample';

export const POST = route({ access: 'variances.approve', params: sampleDecisionParamsSchema, body: sampleDecisionSchema }, async ({ params, body, user }) =>
  decideSample({ partId: params.id, sampleId: params.sampleId, input: body, by: user }),
);
