import 'server-only';
import type { Transaction } from 'sequelize';
import { PieceWeightSample } from '@/models';
import { spreadFromIncrements, spreadFromSamples, type SpreadEstimate } from '@/lib/weighing';

// How much history the estimate looks at: recent enough to follow lot changes (our choice).
const RECENT_SAMPLES = 20;
const MAX_INCREMENTS = 1000;

// Piece-by-piece increments measure c directly and win when there are enough of them;
// otherwise the spread of APWs across recent samples is used. Null when neither has enough.
export async function learnPieceSpread(partId: number, netWeightUncertainty: number, transaction: Transaction): Promise<SpreadEstimate | null> {
  const recent = await PieceWeightSample.findAll({ where: { partId }, order: [['id', 'DESC']], limit: RECENT_SAMPLES, transaction });
  const increments = recent.flatMap((s) => s.incrementsG ?? []).slice(0, MAX_INCREMENTS);
  const fromIncrements = spreadFromIncrements(increments, netWeightUncertainty);
  if (fromIncrements.enough) return fromIncrements;
  const fromSamples = spreadFromSamples(
    recent.map((s) => ({ quantity: s.quantity, averagePieceWeight: Number(s.apwG) })),
    netWeightUncertainty,
  );
  return fromSamples.enough ? fromSamples : null;
}
