import 'server-only';
import { Part, PieceWeightSample } from '@/models';
import { netWeightUncertainty } from '@/lib/weighing';
import { toGrams } from '@/lib/weighing/units';
import type { SessionUser } from '../../auth/session';
import { getDb } from '../../db';
import { AppError, notFound } from '../../errors';
import type { PartDto, RecordSampleInput, SampleDto } from '../../schemas/parts';
import { loadUsableScale, scaleNoise } from '../scales/usable-scale';
import { learnPieceSpread } from './learn-piece-spread';
import { toPartDto, toSampleDto } from './part-dto';

export interface RecordSampleOptions {
  partId: number;
  input: RecordSampleInput;
  by: SessionUser;
}

// Keeps the sample in the part's history and updates the learned APW and spread in one transaction.
export async function recordSample({ partId, input, by }: RecordSampleOptions): Promise<{ sample: SampleDto; part: PartDto }> {
  const db = getDb();
  return db.transaction(async (transaction) => {
    const part = await Part.findByPk(partId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!part) throw notFound('Part');
    if (part.countingMethod === 'hand') throw new AppError('rule_violated', `${part.partNumber} is counted by hand, not by weight`);
    const scale = await loadUsableScale(input.scaleId, transaction);
    const noise = scaleNoise(scale);
    const net = toGrams(input.netWeight, input.unit);
    const increments = input.increments?.map((x) => toGrams(x, input.unit)) ?? null;
    if (increments) checkIncrements(increments, input.quantity, net, noise.division);
    const apw = net / input.quantity;
    const sample = await PieceWeightSample.create(
      { partId, scaleId: scale.id, quantity: input.quantity, netWeightG: String(net), apwG: String(apw), incrementsG: increments, createdBy: by.id },
      { transaction },
    );
    const spread = await learnPieceSpread(partId, netWeightUncertainty(noise), transaction);
    part.apwG = String(apw);
    part.apwSampleSize = input.quantity;
    if (spread) {
      part.pieceSpread = String(Math.min(0.99, spread.pieceSpread));
      part.spreadObservations = spread.observations;
    }
    await part.save({ transaction });
    return { sample: toSampleDto(sample), part: toPartDto(part) };
  });
}

// A sample built piece by piece has one increment per piece, and they add up to the net weight
// (each increment is a difference of rounded readings, so the sum telescopes to within a few d).
function checkIncrements(increments: number[], quantity: number, net: number, division: number): void {
  if (increments.length !== quantity) {
    throw new AppError('validation_failed', 'Some fields need attention', { fields: { increments: `expected ${quantity} increments, one per piece, got ${increments.length}` } });
  }
  const sum = increments.reduce((a, b) => a + b, 0);
  if (Math.abs(sum - net) > 3 * division + 1e-9) {
    throw new AppError('validation_failed', 'Some fields need attention', { fields: { increments: 'the increments do not add up to the sample net weight' } });
  }
}
