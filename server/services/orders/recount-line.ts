import 'server-only';
import { BuildOrderLine, CountEvent } from '@/models';
import { getDb } from '../../db';
import { AppError, notFound } from '../../errors';
import { retryOnDeadlock } from '../../retry-deadlock';
import type { OrderDto } from '@/lib/contracts/orders';
import { getOrder } from './get-order';
import { lockOrder } from './lock-order';

// A line whose count came out uncertain or out of tolerance goes back to the kitting queue: its
// captures stay on record, but the line starts again from nothing and counts only new ones.
export async function recountLine({ orderId, lineId, version }: { orderId: number; lineId: number; version: number }): Promise<OrderDto> {
  const db = getDb();
  await retryOnDeadlock(() =>
    db.transaction(async (transaction) => {
      const order = await lockOrder(orderId, version, transaction);
      if (order.status !== 'released' && order.status !== 'in_progress')
        throw new AppError('rule_violated', `${order.number} is ${order.status}: only an open order's lines are counted again`);
      const line = await BuildOrderLine.findOne({ where: { id: lineId, orderId }, transaction, lock: transaction.LOCK.UPDATE });
      if (!line) throw notFound('Order line');
      if (line.verdict !== 'uncertain' && line.verdict !== 'out') {
        throw new AppError(
          'rule_violated',
          `This line is ${line.verdict === 'in' ? 'in tolerance' : 'not counted yet'}: only an uncertain or out-of-tolerance line is sent back for a recount`,
        );
      }
      const last = await CountEvent.max<number, CountEvent>('id', { where: { orderLineId: line.id }, transaction });
      line.set({ counted: 0, captures: 0, varianceSum: '0', wholePieceRange: 0, verdict: 'open', recountAfterEventId: last ?? null });
      await line.save({ transaction });
      // The order's version moves: a page showing the old line must reload before acting on it.
      order.changed('updatedAt', true);
      await order.save({ transaction });
    }),
  );
  return getOrder({ orderId });
}
