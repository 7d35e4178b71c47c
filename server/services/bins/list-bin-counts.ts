import 'server-only';
import { BinCount } from '@/models';
import { getDb } from '../../db';

export interface BinCountDto {
  id: number;
  binId: number;
  binCode: string;
  partId: number;
  partNumber: string;
  bookQuantity: number;
  counted: number;
  variance: number;
  status: string;
  countEventId: number;
  createdAt: string;
  note: string | null;
}

export async function listBinCounts({ status, binId }: { status?: string; binId?: number }): Promise<BinCountDto[]> {
  getDb();
  const where: Record<string, unknown> = {};
  if (status) where.status = status;
  if (binId) where.binId = binId;
  const rows = await BinCount.findAll({ where, include: [{ association: 'bin', include: [{ association: 'part' }] }], order: [['id', 'DESC']], limit: 500 });
  return rows.map((r) => {
    const bin = (r as BinCount & { bin: { code: string; partId: number; part?: { partNumber: string } } }).bin;
    return {
      id: r.id,
      binId: r.binId,
      binCode: bin.code,
      partId: bin.partId,
      partNumber: bin.part?.partNumber ?? '',
      bookQuantity: r.bookQuantity,
      counted: r.counted,
      variance: r.variance,
      status: r.status,
      countEventId: r.countEventId,
      createdAt: r.createdAt.toISOString(),
      note: r.note,
    };
  });
}
