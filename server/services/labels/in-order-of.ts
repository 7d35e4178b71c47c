import 'server-only';
import { AppError } from '../../errors';

// Rows in the order the ids were asked for (an id twice means two labels); a missing id is a 404 naming it.
export function inOrderOf<T extends { id: number }>(ids: number[], rows: T[], what: string): T[] {
  const byId = new Map(rows.map((r) => [r.id, r]));
  const missing = [...new Set(ids.filter((id) => !byId.has(id)))];
  if (missing.length)
    throw new AppError('not_found', `No ${what} with id ${missing.join(', ')}`, { fields: { ids: `no such ${what}: ${missing.join(', ')}` } });
  return ids.map((id) => byId.get(id)!);
}
