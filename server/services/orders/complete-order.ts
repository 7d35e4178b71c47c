import 'server-only';
import { Bin, BuildOrder, BuildOrderLine, StockMovement } from '@/models';
import type { Transaction } from 'sequelize';
import type { SessionUser } from '../../auth/session';
import { getDb } from '../../db';
import { AppError, notFound } from '../../errors';
import { retryOnDeadlock } from '../../retry-deadlock';
import type { CompleteOrderInput, OrderDto } from '@/lib/contracts/orders';
import { log } from '../../log';
import { printKitLabel } from '../print-jobs/print-kit-label';
import { getOrder } from './get-order';
import { lockOrderStock } from './order-availability';

// Completion turns the reservation into a recorded consumption: what was counted into kits leaves
// the part's bins (largest first), and the hold on stock ends. All in one transaction.
export async function completeOrder({
  orderId,
  input,
  by,
}: {
  orderId: number;
  input: CompleteOrderInput;
  by: SessionUser;
}): Promise<OrderDto & { kitLabel: { jobId: number; status: string } | null }> {
  const db = getDb();
  await retryOnDeadlock(() =>
    db.transaction(async (transaction) => {
      const order = await BuildOrder.findByPk(orderId, { transaction, lock: transaction.LOCK.UPDATE });
      if (!order) throw notFound('Build order');
      if (order.version !== input.version) throw new AppError('stale_version', 'Someone else changed this order; reload and try again');
      if (order.status !== 'released' && order.status !== 'in_progress')
        throw new AppError('rule_violated', `${order.number} is ${order.status.replace('_', ' ')}; only released orders can be completed`);
      const lines = await BuildOrderLine.findAll({ where: { orderId }, order: [['partId', 'ASC']], transaction, lock: transaction.LOCK.UPDATE });
      const notIn = lines.filter((l) => l.verdict !== 'in');
      if (notIn.length && !input.overrideReason) {
        throw new AppError('rule_violated', `${notIn.length} line(s) are not in tolerance; count them, or complete with a reason`, {
          fields: { overrideReason: 'needed while lines are not in tolerance' },
        });
      }
      await lockOrderStock(orderId, transaction);
      await db.query(
        `UPDATE part_stock ps JOIN stock_reservations r ON r.part_id = ps.part_id JOIN build_order_lines l ON l.id = r.order_line_id
            SET ps.reserved = ps.reserved - r.quantity, ps.on_hand = ps.on_hand - l.counted, r.status = 'consumed', r.updated_at = UTC_TIMESTAMP()
          WHERE l.order_id = :orderId AND r.status = 'active'`,
        { replacements: { orderId }, transaction },
      );
      for (const line of lines) if (line.counted > 0) await consumeFromBins(line, order.number, by.id, transaction);
      order.status = 'complete';
      order.completedAt = new Date();
      order.overrideReason = notIn.length ? (input.overrideReason ?? null) : null;
      await order.save({ transaction });
    }),
  );
  // The kit label goes out after the commit; a printer problem is on the print log, not an error here.
  const label = await printKitLabel({ orderId }).catch((err: unknown) => {
    log.error({ err, orderId }, 'kit label could not be queued');
    return null;
  });
  return { ...(await getOrder({ orderId })), kitLabel: label ? { jobId: label.id, status: label.status } : null };
}

async function consumeFromBins(line: BuildOrderLine, orderNumber: string, userId: number, transaction: Transaction): Promise<void> {
  const bins = await Bin.findAll({
    where: { partId: line.partId },
    order: [
      ['bookQuantity', 'DESC'],
      ['id', 'ASC'],
    ],
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
  let left = line.counted;
  for (const [i, bin] of bins.entries()) {
    // The last bin takes any remainder, even below zero: the book must show what really left.
    const take = i === bins.length - 1 ? left : Math.min(left, Math.max(0, bin.bookQuantity));
    if (take === 0) continue;
    bin.bookQuantity -= take;
    await bin.save({ transaction });
    await StockMovement.create(
      {
        partId: line.partId,
        binId: bin.id,
        delta: -take,
        reason: 'consumption',
        refType: 'build_order',
        refId: line.orderId,
        note: `kitted into ${orderNumber}`,
        createdBy: userId,
      },
      { transaction },
    );
    left -= take;
    if (left === 0) break;
  }
  if (left > 0) {
    await StockMovement.create(
      {
        partId: line.partId,
        binId: null,
        delta: -left,
        reason: 'consumption',
        refType: 'build_order',
        refId: line.orderId,
        note: `kitted into ${orderNumber}; no bin held this part`,
        createdBy: userId,
      },
      { transaction },
    );
  }
}
