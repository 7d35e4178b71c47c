import 'server-only';
import type { Transaction } from 'sequelize';
import { PieceWeightSample, Scale } from '@/models';
import { poolSpreads, spreadFromIncrements, spreadFromSamples, type SpreadBelief } from '@/lib/weighing';
import { scaleNoise } from '../scales/usable-scale';

// How much history the spread looks at: recent enough to follow lot changes (our choice).
const RECENT_SAMPLES = 50;

// Samples built piece by piece measure c directly; their beliefs pool, degrees of freedom adding
// up. Without any, the spread of APWs across accepted samples is used. Held or rejected samples
// teach nothing. Null when there is not yet anything to learn from.
export async function learnPieceSpread(partId: number, transaction: Transaction): Promise<SpreadBelief | null> {
  const recent = await PieceWeightSample.findAll({ where: { partId, status: 'accepted' }, order: [['id', 'DESC']], limit: RECENT_SAMPLES, transaction });
  const scaleIds = [...new Set(recent.map((s) => s.scaleId))];
  const scales = new Map((await Scale.findAll({ where: { id: scaleIds }, transaction })).map((s) => [s.id, scaleNoise(s)]));
  const fromIncrements = poolSpreads(
    recent.flatMap((s) => {
      const noise = scales.get(s.scaleId);
      const belief = noise && s.incrementsG ? spreadFromIncrements(s.incrementsG, noise) : null;
      return belief ? [belief] : [];
    }),
  );
  if (fromIncrements) return fromIncrements;
  return spreadFromSamples(recent.map((s) => ({ quantity: s.quantity, averagePieceWeight: Number(s.apwG), netVariance: s.netVarianceG2 ?? 0 })));
}
