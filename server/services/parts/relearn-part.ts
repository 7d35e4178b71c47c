import 'server-only';
import type { Transaction } from 'sequelize';
import { PieceWeightSample, type Part } from '@/models';
import { spreadEstimate } from '@/lib/weighing';
import { learnPieceSpread } from './learn-piece-spread';
import { storeSpreadBelief } from './part-spread-belief';

// The latest accepted sample sets the APW; the spread is learned again from the accepted history.
// The caller holds the part's row lock.
export async function relearnPart(part: Part, transaction: Transaction): Promise<void> {
  const latest = await PieceWeightSample.findOne({ where: { partId: part.id, status: 'accepted' }, order: [['id', 'DESC']], transaction });
  if (latest) {
    part.apwG = latest.apwG;
    part.apwSampleSize = latest.quantity;
  }
  const spread = await learnPieceSpread(part.id, transaction);
  if (spread) storeSpreadBelief(part, spread, spreadEstimate(spread));
  await part.save({ transaction });
}
