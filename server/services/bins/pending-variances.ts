import 'server-only';
import { BinCount } from '@/models';
import { variancePercent } from '@/lib/variance';
import { getDb } from '../../db';
import type { PendingVariance } from '@/lib/contracts/bins';

// Variances beyond the site limits waiting for a planner, quality or an admin, oldest first.
export async function pendingVariances(): Promise<PendingVariance[]> {
  getDb();
  const rows = await BinCount.findAll({
    where: { status: 'pending' },
    include: [
      { association: 'bin', include: [{ association: 'part' }] },
      { association: 'event', attributes: ['id', 'operatorId'], include: [{ association: 'operator', attributes: ['id', 'name'] }] },
    ],
    order: [['id', 'ASC']],
    limit: 500,
  });
  return rows.map((r) => {
    const { bin, event } = r as BinCount & { bin: { code: string; part?: { partNumber: string } }; event: { operatorId: number; operator?: { name: string } } };
    const pct = variancePercent(r.variance, r.bookQuantity);
    return {
      id: r.id,
      binCode: bin.code,
      partNumber: bin.part?.partNumber ?? '',
      bookQuantity: r.bookQuantity,
      counted: r.counted,
      variance: r.variance,
      percent: Number.isFinite(pct) ? Math.round(pct * 10) / 10 : null,
      countedBy: event.operator?.name ?? 'unknown',
      countedById: event.operatorId,
      countedAt: r.createdAt.toISOString(),
    };
  });
}
