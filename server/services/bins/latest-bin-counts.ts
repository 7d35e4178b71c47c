import 'server-only';
import { fn, col, Op } from 'sequelize';
import { BinCount } from '@/models';
import { getDb } from '../../db';
import type { LastVariance } from '@/lib/contracts/bins';

// The newest cycle count of each of these bins: what the bins list shows as its last variance.
export async function latestBinCounts(binIds: number[]): Promise<Record<number, LastVariance>> {
  getDb();
  if (!binIds.length) return {};
  const newest = (await BinCount.findAll({
    attributes: [[fn('MAX', col('id')), 'id']],
    where: { binId: binIds },
    group: ['bin_id'],
    raw: true,
  })) as unknown as Array<{ id: number }>;
  if (!newest.length) return {};
  const rows = await BinCount.findAll({ where: { id: { [Op.in]: newest.map((r) => r.id) } } });
  return Object.fromEntries(rows.map((r) => [r.binId, { variance: r.variance, status: r.status, countedAt: r.createdAt.toISOString() }]));
}
