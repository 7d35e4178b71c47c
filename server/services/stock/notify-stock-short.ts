import 'server-only';
import { QueryTypes } from 'sequelize';
import { Part, PartStock, User } from '@/models';
import { getDb } from '../../db';
import { sendMail } from '../../mail/send-mail';

/**
 * After a booking that lowered a part's stock (an approved variance): if released orders now hold more
 * than is on hand, the planners hear of it, with the orders that hold it. Sent after the commit.
 */
export async function notifyIfStockShort(partId: number, cause: string): Promise<boolean> {
  const stock = await PartStock.findByPk(partId);
  if (!stock || stock.reserved <= stock.onHand) return false;
  const part = await Part.findByPk(partId, { attributes: ['partNumber', 'description'] });
  const holders = await getDb().query<{ number: string; quantity: number }>(
    `SELECT o.number, SUM(r.quantity) AS quantity
       FROM stock_reservations r JOIN build_order_lines l ON l.id = r.order_line_id JOIN build_orders o ON o.id = l.order_id
      WHERE r.part_id = :partId AND r.status = 'active'
      GROUP BY o.number ORDER BY o.number`,
    { replacements: { partId }, type: QueryTypes.SELECT },
  );
  const planners = await User.findAll({ where: { role: 'planner', active: true }, attributes: ['email'] });
  if (!planners.length || !part) return false;
  const short = stock.reserved - stock.onHand;
  await sendMail({
    kind: 'stock_short',
    to: planners.map((p) => p.email),
    subject: `Short of stock: ${part.partNumber} is ${short} below what released orders hold`,
    text: [
      `${cause}. ${part.partNumber} (${part.description}) now has ${stock.onHand} on hand, while released orders hold ${stock.reserved}: short by ${short}.`,
      '',
      ...holders.map((h) => `  ${h.number.padEnd(16)} holds ${Number(h.quantity)}`),
      '',
      'Those orders cannot all be kitted in full. Find the missing pieces, or cancel or hold back an order: Tallyforge → Build orders.',
    ].join('\n'),
  });
  return true;
}
