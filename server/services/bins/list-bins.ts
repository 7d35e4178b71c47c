import 'server-only';
import { Bin } from '@/models';
import { parseBinCode, formatBinCode } from '@/lib/bin-code';
import { getDb } from '../../db';
import type { BinDto } from '../../schemas/bins';
import { toBinDto } from './bin-dto';

export async function listBins({ code, partId }: { code?: string; partId?: number }): Promise<BinDto[]> {
  getDb();
  const where: Record<string, unknown> = {};
  if (code !== undefined) {
    const location = parseBinCode(code);
    if (!location) return [];
    where.code = formatBinCode(location);
  }
  if (partId) where.partId = partId;
  const bins = await Bin.findAll({ where, include: [{ association: 'part' }], order: [['code', 'ASC']], limit: 2000 });
  return bins.map(toBinDto);
}
