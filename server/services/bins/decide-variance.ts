import 'server-only';
import { Bin, BinCount, CountEvent } from '@/models';
import type { SessionUser } from '../../auth/session';
import { getDb } from '../../db';
import { AppError, notFound } from '../../errors';
import { retryOnDeadlock } from '../../retry-deadlock';
import { log } from '../../log';
import { getSettings } from '../settings/get-settings';
import { adjustBin } from '../stock/adjust-bin';
import { notifyIfStockShort } from '../stock/notify-stock-short';
import { notifyRejectedVariance } from './notify-rejected-variance';

// Approving books the variance as counted (the difference, so stock that moved since stays right);
// rejecting leaves the book as it was, puts the bin first on the cycle-count plan again (as if never
// counted) and mails the clerks after the commit. An approved shortfall that leaves released orders
// holding more than is on hand mails the planners. With four eyes on (the default), the person who
// counted the bin cannot decide: a counter approving their own shortfall is what the rule stops.
export async function decideVariance({ binCountId, approve, note, by }: { binCountId: number; approve: boolean; note?: string | null; by: SessionUser }) {
  const db = getDb();
  const { fourEyesVariances } = await getSettings();
  const decided = await retryOnDeadlock(() =>
    db.transaction(async (transaction) => {
      const row = await BinCount.findByPk(binCountId, { transaction, lock: transaction.LOCK.UPDATE });
      if (!row) throw notFound('Bin count');
      if (row.status !== 'pending') throw new AppError('rule_violated', `This variance was already ${row.status}`);
      if (fourEyesVariances) {
        const event = await CountEvent.findByPk(row.countEventId, { attributes: ['operatorId'], transaction });
        if (event?.operatorId === by.id)
          throw new AppError('forbidden', 'You counted this bin, so someone else must approve or reject its variance (four eyes, a site setting)');
      }
      const bin = (await Bin.findByPk(row.binId, { transaction, lock: transaction.LOCK.UPDATE }))!;
      row.set({ status: approve ? 'approved' : 'rejected', decidedBy: by.id, decidedAt: new Date(), note: note ?? null });
      await row.save({ transaction });
      if (approve)
        await adjustBin(
          bin,
          row.variance,
          { type: 'bin_count', id: row.id, note: `variance approved by ${by.name}${note ? `: ${note}` : ''}`.slice(0, 300), by: by.id },
          transaction,
        );
      else {
        bin.lastCountedAt = null;
        await bin.save({ transaction });
      }
      return {
        id: row.id,
        binId: row.binId,
        binCode: bin.code,
        status: row.status,
        variance: row.variance,
        bookQuantity: bin.bookQuantity,
        counted: row.counted,
        partId: bin.partId,
      };
    }),
  );
  if (!approve) await notifyRejectedVariance({ ...decided, note: note ?? null }, by).catch((err) => log.error({ err }, 'rejected-variance notice failed'));
  else if (decided.variance < 0) {
    const cause = `${by.name} approved the count of bin ${decided.binCode}: ${decided.variance} pieces`;
    await notifyIfStockShort(decided.partId, cause).catch((err) => log.error({ err }, 'stock-short notice failed'));
  }
  const { counted: _counted, partId: _partId, ...answer } = decided;
  return answer;
}
