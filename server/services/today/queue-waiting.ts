import 'server-only';
import { QueryTypes } from 'sequelize';
import { getDb } from '../../db';
import type { WaitingItem } from './waiting-item';

// What the kitting bench has to do: lines of released orders not yet in tolerance.
export async function queueWaiting(): Promise<WaitingItem> {
  const [row] = await getDb().query<{ line_count: number; order_count: number }>(
    `SELECT COUNT(*) AS line_count, COUNT(DISTINCT o.id) AS order_count FROM build_order_lines l JOIN build_orders o ON o.id = l.order_id
      WHERE o.status IN ('released', 'in_progress') AND l.verdict <> 'in' AND l.counted < l.required`,
    { type: QueryTypes.SELECT },
  );
  const orders = Number(row?.order_count ?? 0);
  return {
    key: 'queue',
    title: 'Kit lines waiting at the bench',
    count: Number(row?.line_count ?? 0),
    detail: `From ${orders} released order${orders === 1 ? '' : 's'}`,
    href: '/bench',
  };
}
