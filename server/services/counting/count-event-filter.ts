import 'server-only';
import { Op, type WhereOptions } from 'sequelize';
import type { CountEvent } from '@/models';
import type { CountPurpose } from '@/models/columns';

export interface CountEventFilter {
  partId?: number;
  scaleId?: number;
  operatorId?: number;
  purpose?: CountPurpose;
  from?: string;
  to?: string;
}

// Dates without a time are whole UTC days: `to` includes its day.
export function countEventWhere(f: CountEventFilter): WhereOptions<CountEvent> {
  const where: Record<string | symbol, unknown> = {};
  if (f.partId) where.partId = f.partId;
  if (f.scaleId) where.scaleId = f.scaleId;
  if (f.operatorId) where.operatorId = f.operatorId;
  if (f.purpose) where.purpose = f.purpose;
  if (f.from || f.to) {
    const range: Record<symbol, Date> = {};
    if (f.from) range[Op.gte] = new Date(f.from.length === 10 ? `${f.from}T00:00:00Z` : f.from);
    if (f.to) range[Op.lt] = f.to.length === 10 ? new Date(new Date(`${f.to}T00:00:00Z`).getTime() + 86_400_000) : new Date(f.to);
    where.createdAt = range;
  }
  return where as WhereOptions<CountEvent>;
}
