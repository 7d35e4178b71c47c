import 'server-only';
import { QueryTypes } from 'sequelize';
import { getDb } from '../../db';
import type { WaitingItem } from './waiting-item';

// The planner's three piles, from one query: drafts not released, open orders past due, and
// open orders whose every line is in tolerance, waiting only for someone to complete them.
export async function plannerWaiting(today: string): Promise<WaitingItem[]> {
  const [row] = await getDb().query<{ drafts: number; late: number; ready: number }>(
    `SELECT
        SUM(o.status = 'draft') AS drafts,
        SUM(o.status IN ('released', 'in_progress') AND o.due_date < :today) AS late,
        SUM(o.status IN ('released', 'in_progress')
            AND EXISTS (SELECT 1 FROM build_order_lines l WHERE l.order_id = o.id)
            AND NOT EXISTS (SELECT 1 FROM build_order_lines l WHERE l.order_id = o.id AND l.verdict <> 'in')) AS ready
       FROM build_orders o
      WHERE o.status IN ('draft', 'released', 'in_progress')`,
    { replacements: { today }, type: QueryTypes.SELECT },
  );
  return [
    {
      key: 'orders-draft',
      title: 'Draft orders not yet released',
      count: Number(row?.drafts ?? 0),
      detail: 'Check stock and release them to the bench',
      href: '/orders?status=draft',
    },
    {
      key: 'orders-late',
      title: 'Released orders past their due date',
      count: Number(row?.late ?? 0),
      detail: 'Still being kitted after the day they were due',
      href: '/orders?status=open',
    },
    {
      key: 'orders-ready',
      title: 'Orders ready to complete',
      count: Number(row?.ready ?? 0),
      detail: 'Every line counted in tolerance',
      href: '/orders?status=open',
    },
  ];
}
