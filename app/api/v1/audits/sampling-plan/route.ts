import { samplingPlan } from '@/lib/sampling/iso2859';
import { route } from '@/server/http/route';
import { samplingPlanQuerySchema } from '@/lib/contracts/audits';

export const GET = route({ access: 'audits.run', query: samplingPlanQuerySchema }, async ({ query }) => {
  const { codeLetter, sampleSize, accept, reject, inspectAll } = samplingPlan(query.lotSize, query.aql, query.level);
  return { codeLetter, sampleSize, accept, reject, inspectAll };
});
