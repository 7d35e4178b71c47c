import 'server-only';
import { Scale } from '@/models';
import { toGrams } from '@/lib/weighing/units';
import { getDb } from '../../db';
import { AppError, notFound } from '../../errors';
import type { ScaleDto, UpdateScaleInput } from '@/lib/contracts/scales';
import { toScaleDto } from './scale-dto';
import { checkScaleMetrology } from './scale-metrology';

// Profile edits (admin). Status and calibration fields belong to the quality workflow, not here.
export async function updateScale({ scaleId, input }: { scaleId: number; input: UpdateScaleInput }): Promise<ScaleDto> {
  const db = getDb();
  return db.transaction(async (transaction) => {
    const scale = await Scale.findByPk(scaleId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!scale) throw notFound('Scale');
    if (scale.version !== input.version) throw new AppError('stale_version', 'Someone else changed this scale; reload and try again');
    const g = (v: number) => toGrams(v, input.unit);
    const next = {
      capacity: input.capacity === undefined ? Number(scale.capacityG) : g(input.capacity),
      division: input.division === undefined ? Number(scale.divisionG) : g(input.division),
      verificationInterval: input.verificationInterval === undefined ? Number(scale.verificationIntervalG) : g(input.verificationInterval),
      accuracyClass: input.accuracyClass ?? scale.accuracyClass,
      minLoad: input.minLoad === undefined ? Number(scale.minLoadG) : g(input.minLoad),
    };
    const { minLoad } = checkScaleMetrology(next);
    scale.set({
      capacityG: String(next.capacity),
      divisionG: String(next.division),
      verificationIntervalG: String(next.verificationInterval),
      accuracyClass: next.accuracyClass,
      minLoadG: String(minLoad),
    });
    if (input.name !== undefined) scale.name = input.name;
    if (input.location !== undefined) scale.location = input.location ?? null;
    if (input.repeatability !== undefined) scale.repeatabilityG = input.repeatability === null ? null : String(g(input.repeatability));
    if (input.connection !== undefined) scale.connection = input.connection;
    await scale.save({ transaction });
    return toScaleDto(scale);
  });
}
