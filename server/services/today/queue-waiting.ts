import 'server-only';
import { QueryTypes } from 'sequelize';
import { getDb } from '../../db';
import type { WaitingItem } from './waiting-item';

// What the kitting bench has to do: lines of released orders not yet in tolerance.
export async function queueWaiting(): Promise<WaitingItem> {
  const [row] = await getDb().query<{ lines: number; orders: number }>(
    `SELECT COUNT(*) AS lines, COUNT(DISTINCT o.id) AS orders FROM build_order_lines l JOIN build_orders o ON o.id = l.order_id
      WHERE o.status IN ('released', 'in_progress') AND l.verdict <> 'in'`,
    { type: QueryTypes.SELECT },
  );
  const orders = Number(row?.orders ?? 0);
  return { key: 'queue', title: 'Kit lines waiting at the bench', count: Number(row?.lines ?? 0), detail: `From ${orders} released order${orders === 1 ? '' : 's'}`, href: '/bench' };
}
