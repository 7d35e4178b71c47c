import 'server-only';
import { Op, type WhereOptions } from 'sequelize';
import type { CountEvent } from '@/models';
import type { CountPurpose } from '@/lib/domain/counting';
import { dayStart, shiftDay } from '@/lib/time/site-clock';

export interface CountEventFilter {
  partId?: number;
  scaleId?: number;
  operatorId?: number;
  purpose?: CountPurpose;
  from?: string;
  to?: string;
}

// Dates without a time are whole days at the site (`timeZone`): `to` includes its day.
export function countEventWhere(f: CountEventFilter, timeZone: string): WhereOptions<CountEvent> {
  const where: Record<string | symbol, unknown> = {};
  if (f.partId) where.partId = f.partId;
  if (f.scaleId) where.scaleId = f.scaleId;
  if (f.operatorId) where.operatorId = f.operatorId;
  if (f.purpose) where.purpose = f.purpose;
  if (f.from || f.to) {
    const range: Record<symbol, Date> = {};
    if (f.from) range[Op.gte] = f.from.length === 10 ? dayStart(f.from, timeZone) : new Date(f.from);
    if (f.to) range[Op.lt] = f.to.length === 10 ? dayStart(shiftDay(f.to, 1), timeZone) : new Date(f.to);
    where.createdAt = range;
  }
  return where as WhereOptions<CountEvent>;
}
