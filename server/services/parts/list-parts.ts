import 'server-only';
import { Part } from '@/models';
import { getDb } from '../../db';
import { pageOfRows } from '../../db-page';
import { notFound } from '../../errors';
import type { ListPartsQuery, PartDto } from '@/lib/contracts/parts';
import { toPartDto } from './part-dto';
import { partSearch } from './part-search';

export async function listParts(query: ListPartsQuery): Promise<{ parts: PartDto[]; total: number; page: number; pageSize: number }> {
  getDb();
  const { rows, ...at } = await pageOfRows(Part, {
    where: partSearch(query.q),
    order: [
      [query.sort, query.dir.toUpperCase()],
      ['id', 'ASC'],
    ],
    page: query.page,
    pageSize: query.pageSize,
  });
  return { parts: rows.map(toPartDto), ...at };
}

export async function getPart({ partId }: { partId: number }): Promise<PartDto> {
  getDb();
  const part = await Part.findByPk(partId);
  if (!part) throw notFound('Part');
  return toPartDto(part);
}
