import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { TestWeight } from '@/models';
import { weightMpeMg, type WeightClass } from '@/lib/metrology/weight-classes';
import { AppError } from '../../errors';

export interface WeightCheck {
  adequate: boolean;
  problems: string[];
}

// Test weights must be in date, and their combined MPE at each load at most 1/3 of the scale's
// MPE there (OIML R 76-1 3.7.1, from memory). MPEs of weights that make up one load add up.
export async function checkTestWeights(
  points: ReadonlyArray<{ load: number; mpe: number; testWeightIds: readonly number[] }>,
  performedAt: string,
  transaction: Transaction,
): Promise<WeightCheck> {
  const ids = [...new Set(points.flatMap((p) => p.testWeightIds))];
  const weights = await TestWeight.findAll({ where: { id: { [Op.in]: ids } }, transaction });
  const byId = new Map(weights.map((w) => [w.id, w]));
  const missing = ids.filter((id) => !byId.has(id));
  if (missing.length)
    throw new AppError('validation_failed', 'Unknown test weights', { fields: { testWeightIds: `no test weight with id ${missing.join(', ')}` } });
  const problems: string[] = [];
  for (const w of weights) {
    if (!w.active) problems.push(`${w.identifier} is retired`);
    if (w.dueAt && w.dueAt < performedAt) problems.push(`${w.identifier} was due for recalibration on ${w.dueAt}`);
  }
  for (const p of points) {
    const set = p.testWeightIds.map((id) => byId.get(id)!);
    const nominal = set.reduce((a, w) => a + Number(w.nominalG), 0);
    const mpeG = set.reduce((a, w) => a + (weightMpeMg(Number(w.nominalG), w.weightClass as WeightClass) ?? Infinity), 0) / 1000;
    if (Math.abs(nominal - p.load) > p.mpe) problems.push(`the weights for ${p.load} g add up to ${nominal} g`);
    if (mpeG > p.mpe / 3 + 1e-12) problems.push(`at ${p.load} g the weights' MPE ${mpeG} g exceeds 1/3 of the scale's MPE ${p.mpe} g`);
  }
  return { adequate: problems.length === 0, problems };
}
