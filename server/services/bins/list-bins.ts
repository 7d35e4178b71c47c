import 'server-only';
import { Op } from 'sequelize';
import { Bin } from '@/models';
import { parseBinCode, formatBinCode } from '@/lib/bin-code';
import { getDb } from '../../db';
import { pageOfRows } from '../../db-page';
import { startsWithPattern, type PageOf } from '@/lib/contracts/common';
import type { BinDto, ListBinsQuery } from '@/lib/contracts/bins';
import { toBinDto } from './bin-dto';

// One page of bins in code order, which is also the walk order of the stockroom.
export async function listBins(query: ListBinsQuery): Promise<PageOf & { bins: BinDto[] }> {
  getDb();
  const { code, partId, q, page, pageSize } = query;
  const where: Record<string | symbol, unknown> = {};
  if (code !== undefined) {
    const location = parseBinCode(code);
    if (!location) return { bins: [], total: 0, page, pageSize };
    where.code = formatBinCode(location);
  }
  if (partId) where.partId = partId;
  if (q) {
    const pattern = startsWithPattern(q);
    where[Op.or] = [{ code: { [Op.like]: pattern } }, { '$part.part_number$': { [Op.like]: pattern } }];
  }
  const { rows, ...at } = await pageOfRows(Bin, {
    where,
    include: [{ association: 'part' }],
    filterJoins: q ? [{ association: 'part' }] : undefined,
    order: [['code', 'ASC']],
    page,
    pageSize,
  });
  return { bins: rows.map(toBinDto), ...at };
}
