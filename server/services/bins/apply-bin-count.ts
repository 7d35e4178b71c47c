import 'server-only';
import type { Transaction } from 'sequelize';
import { Bin, BinCount } from '@/models';
import { needsApproval } from '@/lib/variance';
import { AppError } from '../../errors';
import { adjustBin } from '../stock/adjust-bin';

export interface BinCountResult {
  id: number;
  binId: number;
  bookQuantity: number;
  counted: number;
  variance: number;
  status: string;
}

// A bin capture inside the capture's transaction. The bin's version guards against two clerks
// counting one bin at once: the second capture, started from the old version, gets 409.
export async function applyBinCount(
  opts: { binId: number; binVersion: number; partId: number; countEventId: number; counted: number; limits: { pieces: number; percent: number }; by: number },
  transaction: Transaction,
): Promise<BinCountResult> {
  const bin = await Bin.findByPk(opts.binId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!bin) throw new AppError('not_found', 'Bin was not found', { fields: { binId: 'no such bin' } });
  if (bin.partId !== opts.partId) throw new AppError('validation_failed', 'That bin holds another part', { fields: { partId: 'does not match the bin' } });
  if (bin.version !== opts.binVersion) throw new AppError('stale_version', `Bin ${bin.code} was counted or changed by someone else meanwhile; count it again`);
  const variance = opts.counted - bin.bookQuantity;
  const pending = needsApproval(variance, bin.bookQuantity, opts.limits);
  const row = await BinCount.create(
    {
      binId: bin.id,
      countEventId: opts.countEventId,
      bookQuantity: bin.bookQuantity,
      counted: opts.counted,
      variance,
      status: pending ? 'pending' : 'applied',
      decidedBy: null,
      decidedAt: null,
      note: null,
    },
    { transaction },
  );
  bin.lastCountedAt = new Date();
  if (!pending) await adjustBin(bin, variance, { type: 'bin_count', id: row.id, note: 'cycle count within limits', by: opts.by }, transaction);
  if (bin.changed()) await bin.save({ transaction });
  return { id: row.id, binId: bin.id, bookQuantity: row.bookQuantity, counted: row.counted, variance, status: row.status };
}
