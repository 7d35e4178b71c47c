import { route } from '@/server/http/route';
import { lockScaleSchema } from '@/lib/contracts/calibration';
import { idParamSchema } from '@/lib/contracts/common';
import { lockScale } from '@/server/services/calibration/lock-scale';

export const POST = route({ access: 'calibration.manage', params: idParamSchema, body: lockScaleSchema }, async ({ params, body, user }) => ({
  scale: await lockScale({ scaleId: params.id, reason: body.reason, by: user }),
}));
