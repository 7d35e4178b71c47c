import 'server-only';
import { Op, type WhereOptions } from 'sequelize';
import { CountEvent } from '@/models';
import { getDb } from '../../db';
import type { CountEventDto, ListCountsQuery } from '../../schemas/counts';
import { toCountEventDto } from './count-event-dto';

export async function listCounts(query: ListCountsQuery): Promise<{ counts: CountEventDto[]; total: number; page: number; pageSize: number }> {
  getDb();
  const where: WhereOptions<CountEvent> = {};
  if (query.partId) Object.assign(where, { partId: query.partId });
  if (query.scaleId) Object.assign(where, { scaleId: query.scaleId });
  if (query.operatorId) Object.assign(where, { operatorId: query.operatorId });
  if (query.purpose) Object.assign(where, { purpose: query.purpose });
  if (query.from || query.to) {
    Object.assign(where, {
      createdAt: { ...(query.from ? { [Op.gte]: new Date(query.from) } : {}), ...(query.to ? { [Op.lt]: new Date(query.to) } : {}) },
    });
  }
  const { rows, count } = await CountEvent.findAndCountAll({
    where,
    order: [['id', 'DESC']],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
  return { counts: rows.map(toCountEventDto), total: count, page: query.page, pageSize: query.pageSize };
}
