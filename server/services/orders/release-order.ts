import 'server-only';
import { BuildOrder, User } from '@/models';
import type { SessionUser } from '../../auth/session';
import { getDb } from '../../db';
import { AppError, notFound } from '../../errors';
import { retryOnDeadlock } from '../../retry-deadlock';
import { sendMail } from '../../mail/send-mail';
import type { AvailabilityLine, OrderDto } from '@/lib/contracts/orders';
import { getOrder } from './get-order';
import { orderAvailability } from './order-availability';
import { releaseMail, shortageMail } from './order-mails';

// Release reserves every line's stock in one transaction, with set-based statements whatever the
// number of lines. Competing releases queue on the part_stock row locks, so stock is never over-reserved.
export async function releaseOrder({ orderId, version, by }: { orderId: number; version: number; by: SessionUser }): Promise<OrderDto> {
  const db = getDb();
  let shortages: AvailabilityLine[] = [];
  let number = '';
  // A part never stocked gets its zero row first, in a statement of its own: inside the release it
  // would hold shared locks that two releases then both try to raise to exclusive (a sure deadlock).
  await db.query(`INSERT IGNORE INTO part_stock (part_id, on_hand, reserved) SELECT part_id, 0, 0 FROM build_order_lines WHERE order_id = :orderId`, {
    replacements: { orderId },
  });
  try {
    await retryOnDeadlock(() =>
      db.transaction(async (transaction) => {
        const order = await BuildOrder.findByPk(orderId, { transaction, lock: transaction.LOCK.UPDATE });
        if (!order) throw notFound('Build order');
        number = order.number;
        if (order.version !== version) throw new AppError('stale_version', 'Someone else changed this order; reload and try again');
        if (order.status !== 'draft')
          throw new AppError('rule_violated', `Only a draft order can be released; ${order.number} is ${order.status.replace('_', ' ')}`);
        const replacements = { orderId };
        const lines = await orderAvailability(orderId, { transaction, lockRows: true });
        shortages = lines.filter((l) => l.shortage > 0);
        if (shortages.length) {
          const list = shortages.map((s) => `${s.partNumber} short by ${s.shortage}`).join(', ');
          throw new AppError('rule_violated', `Not enough stock to release ${order.number}: ${list}`, {
            fields: Object.fromEntries(shortages.map((s) => [`parts.${s.partNumber}`, `short by ${s.shortage}`])),
          });
        }
        await db.query(
          `UPDATE part_stock ps JOIN build_order_lines l ON l.part_id = ps.part_id SET ps.reserved = ps.reserved + l.required WHERE l.order_id = :orderId`,
          { replacements, transaction },
        );
        await db.query(
          `INSERT INTO stock_reservations (order_line_id, part_id, quantity, status, created_at, updated_at)
         SELECT id, part_id, required, 'active', UTC_TIMESTAMP(), UTC_TIMESTAMP() FROM build_order_lines WHERE order_id = :orderId`,
          { replacements, transaction },
        );
        order.status = 'released';
        order.releasedAt = new Date();
        await order.save({ transaction });
      }),
    );
  } catch (err) {
    if (shortages.length) await notify('planner', shortageMail(number, shortages));
    throw err;
  }
  const released = await getOrder({ orderId });
  await notify('operator', releaseMail(released, by.name));
  return released;
}

async function notify(role: 'planner' | 'operator', mail: { subject: string; text: string; kind: string }): Promise<void> {
  const people = await User.findAll({ where: { role, active: true }, attributes: ['email'] });
  await sendMail({ ...mail, to: people.map((p) => p.email) });
}
