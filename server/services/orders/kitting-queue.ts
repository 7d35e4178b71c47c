import 'server-only';
import { QueryTypes } from 'sequelize';
import { getDb } from '../../db';
import { lineUncertainty } from './line-verdict';
import type { QueueLine } from '@/lib/contracts/orders';

// Lines of released orders with pieces still to count, the most urgent order first. A line counted in
// full but not in tolerance (over, or an uncertain total) is the planner's to decide, not the bench's:
// adding pieces can only move it further off.
export async function kittingQueue(): Promise<QueueLine[]> {
  const rows = await getDb().query<Record<string, unknown>>(
    `SELECT l.id AS order_line_id, o.id AS order_id, o.number, k.code, k.revision, o.due_date, p.id AS part_id, p.part_number, p.description,
            l.required, l.counted, l.tolerance_below, l.tolerance_above, l.variance_sum, l.whole_piece_range, l.verdict
       FROM build_order_lines l
       JOIN build_orders o ON o.id = l.order_id
       JOIN kits k ON k.id = o.kit_id
       JOIN parts p ON p.id = l.part_id
      WHERE o.status IN ('released', 'in_progress') AND l.verdict <> 'in' AND l.counted < l.required
      ORDER BY o.due_date IS NULL, o.due_date, o.id, p.part_number
      LIMIT 500`,
    { type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({
    orderLineId: Number(r.order_line_id),
    orderId: Number(r.order_id),
    orderNumber: String(r.number),
    kitCode: String(r.code),
    kitRevision: String(r.revision),
    dueDate: r.due_date ? String(r.due_date) : null,
    partId: Number(r.part_id),
    partNumber: String(r.part_number),
    description: String(r.description),
    required: Number(r.required),
    counted: Number(r.counted),
    remaining: Math.max(0, Number(r.required) - Number(r.counted)),
    toleranceBelow: Number(r.tolerance_below),
    toleranceAbove: Number(r.tolerance_above),
    expandedUncertainty: lineUncertainty(Number(r.variance_sum)),
    wholePieceRange: Number(r.whole_piece_range),
    verdict: String(r.verdict),
  }));
}
