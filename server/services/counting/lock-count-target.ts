import 'server-only';
import type { Transaction } from 'sequelize';
import { Bin, BuildOrderLine } from '@/models';
import type { RecordCountInput } from '@/lib/contracts/counts';

// Takes the exclusive lock on the bin or order line a capture fills before the capture row is
// written: the row's foreign key would otherwise take a shared lock first, and two captures
// upgrading shared locks on one bin deadlock each other.
export async function lockCountTarget(input: Pick<RecordCountInput, 'binId' | 'orderLineId'>, transaction: Transaction): Promise<void> {
  if (input.binId) await Bin.findByPk(input.binId, { transaction, lock: transaction.LOCK.UPDATE, attributes: ['id'] });
  if (input.orderLineId) await BuildOrderLine.findByPk(input.orderLineId, { transaction, lock: transaction.LOCK.UPDATE, attributes: ['id'] });
}
