import 'server-only';
import { Scale } from '@/models';
import type { SessionUser } from '../../auth/session';
import { getDb } from '../../db';
import { notFound } from '../../errors';
import type { ScaleDto } from '@/lib/contracts/scales';
import { toScaleDto } from '../scales/scale-dto';

// A manual lock-out (dropped, damaged, suspect). Only a passing calibration record lifts it.
export async function lockScale({ scaleId, reason, by }: { scaleId: number; reason: string; by: SessionUser }): Promise<ScaleDto> {
  const db = getDb();
  return db.transaction(async (transaction) => {
    const scale = await Scale.findByPk(scaleId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!scale) throw notFound('Scale');
    scale.set({ status: 'locked', statusReason: `${reason} (locked by ${by.name})`.slice(0, 300) });
    await scale.save({ transaction });
    return toScaleDto(scale);
  });
}
