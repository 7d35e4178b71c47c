import { route } from '@/server/http/route';
import { evaluateCalibrationSchema } from '@/lib/contracts/calibration';
import { evaluateInUnit } from '@/server/services/calibration/evaluate';

export const POST = route({ access: 'calibration.manage', body: evaluateCalibrationSchema }, async ({ body }) => evaluateInUnit(body));
