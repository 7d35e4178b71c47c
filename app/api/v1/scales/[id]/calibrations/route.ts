import { created, route } from '@/server/http/route';
import { recordCalibrationSchema } from '@/lib/contracts/calibration';
import { idParamSchema } from '@/lib/contracts/common';
import { listCalibrations } from '@/server/services/calibration/list-calibrations';
import { recordCalibration } from '@/server/services/calibration/record-calibration';

export const GET = route({ access: 'catalog.read', params: idParamSchema }, async ({ params }) => ({
  records: await listCalibrations({ scaleId: params.id }),
}));

export const POST = route({ access: 'calibration.manage', params: idParamSchema, body: recordCalibrationSchema }, async ({ params, body, user }) =>
  created({ record: await recordCalibration({ scaleId: params.id, input: body, by: user }) }),
);
