import 'server-only';
import { CountEvent } from '@/models';
import { getDb } from '../../db';
import { siteTimeZone } from '../settings/get-settings';
import type { CountEventDto, ListCountsQuery } from '../../schemas/counts';
import { toCountEventDto } from './count-event-dto';
import { countEventWhere } from './count-event-filter';

export async function listCounts(query: ListCountsQuery): Promise<{ counts: CountEventDto[]; total: number; page: number; pageSize: number }> {
  getDb();
  const where = countEventWhere(query, await siteTimeZone());
  const { rows, count } = await CountEvent.findAndCountAll({
    where,
    order: [['id', 'DESC']],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
  return { counts: rows.map(toCountEventDto), total: count, page: query.page, pageSize: query.pageSize };
}
