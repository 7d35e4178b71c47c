import 'server-only';
import { QueryTypes, type Transaction } from 'sequelize';
import { getDb } from '../../db';
import type { AvailabilityLine } from '@/lib/contracts/orders';

interface Row {
  part_id: number;
  part_number: string;
  required: number;
  on_hand: number | null;
  reserved: number | null;
}

interface StockRow {
  part_id: number;
  on_hand: number;
  reserved: number;
}

/**
 * Locks the part_stock rows of these parts, one by one in part id order (a primary-key range read in
 * ascending order), so every transaction that takes several stock rows takes them in the same order and
 * two of them cannot each hold a row the other waits for. Only part_stock is locked, not the rows a join
 * would read beside it (parts, which captures update).
 */
async function lockStockRows(partIds: number[], transaction: Transaction): Promise<Map<number, StockRow>> {
  const ids = [...new Set(partIds)].sort((a, b) => a - b);
  if (!ids.length) return new Map();
  const rows = await getDb().query<StockRow>('SELECT part_id, on_hand, reserved FROM part_stock WHERE part_id IN (:ids) ORDER BY part_id FOR UPDATE', {
    replacements: { ids },
    type: QueryTypes.SELECT,
    transaction,
  });
  return new Map(rows.map((r) => [r.part_id, r]));
}

/** Locks the stock rows of every part on this order (lockStockRows' order). */
export async function lockOrderStock(orderId: number, transaction: Transaction): Promise<void> {
  const lines = await getDb().query<{ part_id: number }>('SELECT part_id FROM build_order_lines WHERE order_id = :orderId', {
    replacements: { orderId },
    type: QueryTypes.SELECT,
    transaction,
  });
  await lockStockRows(
    lines.map((l) => l.part_id),
    transaction,
  );
}

// Required per part against stock on hand minus what other orders hold. One query for the whole order;
// with `lockRows` the stock figures come from the locked rows (lockStockRows), which serialises competing releases.
export async function orderAvailability(orderId: number, opts: { transaction?: Transaction; lockRows?: boolean } = {}): Promise<AvailabilityLine[]> {
  const rows = await getDb().query<Row>(
    `SELECT l.part_id, p.part_number, l.required, ps.on_hand, ps.reserved
       FROM build_order_lines l
       JOIN parts p ON p.id = l.part_id
       LEFT JOIN part_stock ps ON ps.part_id = l.part_id
      WHERE l.order_id = :orderId
      ORDER BY l.part_id`,
    { replacements: { orderId }, type: QueryTypes.SELECT, transaction: opts.transaction },
  );
  const locked =
    opts.lockRows && opts.transaction
      ? await lockStockRows(
          rows.map((r) => r.part_id),
          opts.transaction,
        )
      : undefined;
  return rows.map((r) => {
    const stock = locked ? locked.get(r.part_id) : r;
    const onHand = Number(stock?.on_hand ?? 0);
    const reserved = Number(stock?.reserved ?? 0);
    const available = onHand - reserved;
    return { partId: r.part_id, partNumber: r.part_number, required: r.required, onHand, reserved, available, shortage: Math.max(0, r.required - available) };
  });
}
