import 'server-only';
import type { Transaction } from 'sequelize';
import { Scale } from '@/models';
import { AppError } from '../../errors';

// Loads a scale for a capture inside the caller's transaction. The shared row lock makes a
// concurrent lock-out wait for this capture, or this capture see the lock-out.
export async function loadUsableScale(scaleId: number, transaction: Transaction): Promise<Scale> {
  const scale = await Scale.findByPk(scaleId, { transaction, lock: transaction.LOCK.SHARE });
  if (!scale) throw new AppError('not_found', 'Scale was not found', { fields: { scaleId: 'no such scale' } });
  if (scale.status === 'locked') {
    throw new AppError('scale_locked', `Scale ${scale.name} is locked out${scale.statusReason ? `: ${scale.statusReason}` : ''}. Use another scale or ask quality to check it.`);
  }
  return scale;
}

export function scaleNoise(scale: Scale): { division: number; repeatability: number } {
  return { division: Number(scale.divisionG), repeatability: scale.repeatabilityG === null ? 0 : Number(scale.repeatabilityG) };
}

