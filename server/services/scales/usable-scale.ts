import 'server-only';
import type { Transaction } from 'sequelize';
import { Scale } from '@/models';
import { calibrationOverdue } from '@/lib/metrology/calibration-due';
import { mpeAt } from '@/lib/metrology/mpe';
import { rectangularUncertainty, type WeighingScale } from '@/lib/weighing';
import { AppError } from '../../errors';

// Loads a scale for a capture inside the caller's transaction. The shared row lock makes a
// concurrent lock-out wait for this capture, or this capture see the lock-out. A scale past its
// calibration date is refused here too, not only once the hourly reminder has locked it; `today` is the
// site's day, worked out by the caller before its transaction (no second connection from inside it).
export async function loadUsableScale(scaleId: number, transaction: Transaction, today: string): Promise<Scale> {
  const scale = await Scale.findByPk(scaleId, { transaction, lock: transaction.LOCK.SHARE });
  if (!scale) throw new AppError('not_found', 'Scale was not found', { fields: { scaleId: 'no such scale' } });
  if (scale.status === 'locked') {
    throw new AppError(
      'scale_locked',
      `Scale ${scale.name} is locked out${scale.statusReason ? `: ${scale.statusReason}` : ''}. Use another scale or ask quality to check it.`,
    );
  }
  if (calibrationOverdue(scale.calibrationDueAt, today)) {
    throw new AppError(
      'scale_locked',
      `Scale ${scale.name} was due for calibration on ${scale.calibrationDueAt} and may not be used until a passing test is recorded. Use another scale or ask quality to test it.`,
    );
  }
  return scale;
}

export function scaleNoise(scale: Scale): { division: number; repeatability: number } {
  return { division: Number(scale.divisionG), repeatability: scale.repeatabilityG === null ? 0 : Number(scale.repeatabilityG) };
}

// The scale as a count weighs with it at one load, when sample and bulk are on different scales:
// its calibration is known to its in-service MPE there (OIML R 76-1 Table 6, twice in service),
// taken as rectangular (GUM 4.3.7: u = MPE/√3).
export function scaleWeighingAt(scale: Scale, load: number): WeighingScale {
  const mpe = mpeAt(scale.accuracyClass, Number(scale.verificationIntervalG), load, 'in_service');
  return { ...scaleNoise(scale), calibrationUncertainty: rectangularUncertainty(mpe) };
}
