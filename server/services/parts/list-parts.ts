import 'server-only';
import { Op } from 'sequelize';
import { Part } from '@/models';
import { getDb } from '../../db';
import { notFound } from '../../errors';
import type { ListPartsQuery, PartDto } from '../../schemas/parts';
import { toPartDto } from './part-dto';

export async function listParts(query: ListPartsQuery): Promise<{ parts: PartDto[]; total: number; page: number; pageSize: number }> {
  getDb();
  const where = query.q
    ? { [Op.or]: [{ partNumber: { [Op.like]: `%${escapeLike(query.q)}%` } }, { description: { [Op.like]: `%${escapeLike(query.q)}%` } }] }
    : {};
  const { rows, count } = await Part.findAndCountAll({
    where,
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

function escapeLike(text: string): string {
  return text.replace(/[\\%_]/g, (c) => `\\${c}`);
}
