import 'server-only';
import { fn, col, Op } from 'sequelize';
import { BinCount } from '@/models';
import { getDb } from '../../db';

export interface LastVariance {
  variance: number;
  status: string;
  countedAt: string;
}

// The newest cycle count of each bin: what the bins list shows as its last variance.
export async function latestBinCounts(): Promise<Record<number, LastVariance>> {
  getDb();
  const newest = (await BinCount.findAll({ attributes: [[fn('MAX', col('id')), 'id']], group: ['bin_id'], raw: true })) as unknown as Array<{ id: number }>;
  if (!newest.length) return {};
  const rows = await BinCount.findAll({ where: { id: { [Op.in]: newest.map((r) => r.id) } } });
  return Object.fromEntries(rows.map((r) => [r.binId, { variance: r.variance, status: r.status, countedAt: r.createdAt.toISOString() }]));
}
