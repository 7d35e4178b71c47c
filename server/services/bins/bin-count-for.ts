import 'server-only';
import { BinCount } from '@/models';
import type { BinCountResult } from './apply-bin-count';

export async function binCountFor(countEventId: number): Promise<BinCountResult | null> {
  const row = await BinCount.findOne({ where: { countEventId } });
  return row && { id: row.id, binId: row.binId, bookQuantity: row.bookQuantity, counted: row.counted, variance: row.variance, status: row.status };
}
