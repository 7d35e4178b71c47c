import 'server-only';
import { col, fn, literal, Op, type WhereOptions } from 'sequelize';
import { BuildOrder, BuildOrderLine } from '@/models';
import { getDb } from '../../db';
import { pageOfRows } from '../../db-page';
import { startsWithPattern, type PageOf } from '@/lib/contracts/common';
import type { ListOrdersQuery, OrderSummaryDto } from '@/lib/contracts/orders';
import { toOrderSummaryDto } from './order-dto';

const OPEN = ['draft', 'released', 'in_progress'];

function orderWhere({ status, q }: Pick<ListOrdersQuery, 'status' | 'q'>): WhereOptions<BuildOrder> {
  const where: Record<string | symbol, unknown> = {};
  if (status) where.status = status === 'open' ? { [Op.in]: OPEN } : status;
  if (q) {
    const pattern = startsWithPattern(q);
    where[Op.or] = [{ number: { [Op.like]: pattern } }, { '$kit.code$': { [Op.like]: pattern } }];
  }
  return where as WhereOptions<BuildOrder>;
}

// One page of orders, newest first, each with its progress counted in the database: a list never loads
// the lines of every order it shows.
export async function listOrders(query: ListOrdersQuery): Promise<PageOf & { orders: OrderSummaryDto[] }> {
  getDb();
  const { page, pageSize } = query;
  const { rows, total } = await pageOfRows(BuildOrder, {
    where: orderWhere(query),
    include: [{ association: 'kit' }],
    filterJoins: query.q ? [{ association: 'kit' }] : undefined,
    order: [['id', 'DESC']],
    page,
    pageSize,
  });
  const progress = rows.length
    ? ((await BuildOrderLine.findAll({
        attributes: ['orderId', [fn('COUNT', col('id')), 'lines'], [fn('SUM', literal("verdict = 'in'")), 'linesDone']],
        where: { orderId: rows.map((o) => o.id) },
        group: ['orderId'],
        raw: true,
      })) as unknown as Array<{ orderId: number; lines: number | string; linesDone: number | string | null }>)
    : [];
  const byOrder = new Map(progress.map((p) => [p.orderId, { lines: Number(p.lines), linesDone: Number(p.linesDone ?? 0) }]));
  return { orders: rows.map((o) => toOrderSummaryDto(o, byOrder.get(o.id) ?? { lines: 0, linesDone: 0 })), total, page, pageSize };
}
