import 'server-only';
import { Op, type WhereOptions } from 'sequelize';
import type { Part } from '@/models';

// Free-text search on part number or description; LIKE wildcards typed by the user match literally.
export function partSearch(q: string | undefined): WhereOptions<Part> {
  if (!q) return {};
  const pattern = `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
  return { [Op.or]: [{ partNumber: { [Op.like]: pattern } }, { description: { [Op.like]: pattern } }] };
}
