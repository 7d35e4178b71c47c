import 'server-only';
import { getDb } from '../../db';
import { AppError } from '../../errors';
import { retryOnDeadlock } from '../../retry-deadlock';
import type { OrderDto } from '@/lib/contracts/orders';
import { getOrder } from './get-order';
import { lockOrder } from './lock-order';
import { lockOrderStock } from './order-availability';

// Cancelling gives back whatever the order still holds.
export async function cancelOrder({ orderId, version }: { orderId: number; version: number }): Promise<OrderDto> {
  const db = getDb();
  await retryOnDeadlock(() =>
    db.transaction(async (transaction) => {
      const order = await lockOrder(orderId, version, transaction);
      if (order.status === 'complete' || order.status === 'cancelled') throw new AppError('rule_violated', `${order.number} is already ${order.status}`);
      const replacements = { orderId };
      await lockOrderStock(orderId, transaction);
      await db.query(
        `UPDATE part_stock ps JOIN stock_reservations r ON r.part_id = ps.part_id JOIN build_order_lines l ON l.id = r.order_line_id
            SET ps.reserved = ps.reserved - r.quantity, r.status = 'released', r.updated_at = UTC_TIMESTAMP()
          WHERE l.order_id = :orderId AND r.status = 'active'`,
        { replacements, transaction },
      );
      order.status = 'cancelled';
      order.cancelledAt = new Date();
      await order.save({ transaction });
    }),
  );
  return getOrder({ orderId });
}
