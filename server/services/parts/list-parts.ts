import 'server-only';
import { Part } from '@/models';
import { getDb } from '../../db';
import { notFound } from '../../errors';
import type { ListPartsQuery, PartDto } from '../../schemas/parts';
import { toPartDto } from './part-dto';
import { partSearch } from './part-search';

export async function listParts(query: ListPartsQuery): Promise<{ parts: PartDto[]; total: number; page: number; pageSize: number }> {
  getDb();
  const { rows, count } = await Part.findAndCountAll({
    where: partSearch(query.q),
    order: [[query.sort, query.dir.toUpperCase()]],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
  return { parts: rows.map(toPartDto), total: count, page: query.page, pageSize: query.pageSize };
}

export async function getPart({ partId }: { partId: number }): Promise<PartDto> {
  getDb();
  const part = await Part.findByPk(partId);
  if (!part) throw notFound('Part');
  return toPartDto(part);
}
