import 'server-only';
import type { Transaction } from 'sequelize';
import { StockMovement, type Bin } from '@/models';
import { addOnHand } from './add-on-hand';

// Books a counted variance on a bin: the bin, the part's on-hand total and the append-only
// movement log change together, in the caller's transaction.
export async function adjustBin(bin: Bin, delta: number, ref: { type: string; id: number; note: string; by: number }, transaction: Transaction): Promise<void> {
  if (delta === 0) return;
  bin.bookQuantity += delta;
  await bin.save({ transaction });
  await StockMovement.create(
    { partId: bin.partId, binId: bin.id, delta, reason: 'adjustment', refType: ref.type, refId: ref.id, note: ref.note, createdBy: ref.by },
    { transaction },
  );
  await addOnHand(bin.partId, delta, transaction);
}
