import { created, route } from '@/server/http/route';
import { createTestWeightSchema } from '@/lib/contracts/calibration';
import { createTestWeight, listTestWeights } from '@/server/services/calibration/test-weights';

export const GET = route({ access: 'catalog.read' }, async () => ({ testWeights: await listTestWeights() }));

export const POST = route({ access: 'calibration.manage', body: createTestWeightSchema }, async ({ body }) =>
  created({ testWeight: await createTestWeight({ input: body }) }),
);
