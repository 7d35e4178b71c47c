import 'server-only';
import { QueryTypes, type Transaction } from 'sequelize';
import { getDb } from '../../db';
import type { AvailabilityLine } from '../../schemas/orders';

interface Row {
  part_id: number;
  part_number: string;
  required: number;
  on_hand: number | null;
  reserved: number | null;
}

// Required per part against stock on hand minus what other orders hold. One query for the whole order;
// with `lockRows` the part_stock rows are locked in part order, which serialises competing releases.
export async function orderAvailability(orderId: number, opts: { transaction?: Transaction; lockRows?: boolean } = {}): Promise<AvailabilityLine[]> {
  const rows = await getDb().query<Row>(
    `SELECT l.part_id, p.part_number, l.required, ps.on_hand, ps.reserved
       FROM build_order_lines l
       JOIN parts p ON p.id = l.part_id
       LEFT JOIN part_stock ps ON ps.part_id = l.part_id
      WHERE l.order_id = :orderId
      ORDER BY l.part_id${opts.lockRows ? ' FOR UPDATE' : ''}`,
    { replacements: { orderId }, type: QueryTypes.SELECT, transaction: opts.transaction },
  );
  return rows.map((r) => {
    const onHand = Number(r.on_hand ?? 0);
    const reserved = Number(r.reserved ?? 0);
    const available = onHand - reserved;
    return { partId: r.part_id, partNumber: r.part_number, required: r.required, onHand, reserved, available, shortage: Math.max(0, r.required - available) };
  });
}
