import 'server-only';
import { CalibrationRecord, Scale } from '@/models';
import { getDb } from '../../db';
import { notFound } from '../../errors';
import type { CalibrationRecordDto } from '@/lib/contracts/calibration';
import { toCalibrationRecordDto } from './calibration-record-dto';

export async function listCalibrations({ scaleId }: { scaleId: number }): Promise<CalibrationRecordDto[]> {
  getDb();
  if (!(await Scale.count({ where: { id: scaleId } }))) throw notFound('Scale');
  const rows = await CalibrationRecord.findAll({
    where: { scaleId },
    order: [
      ['performedAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: 200,
  });
  return rows.map(toCalibrationRecordDto);
}
