import 'server-only';
import { CountEvent } from '@/models';
import { getDb } from '../../db';
import { pageOfRows } from '../../db-page';
import { siteTimeZone } from '../settings/get-settings';
import type { CountEventDto, ListCountsQuery } from '@/lib/contracts/counts';
import { toCountEventDto } from './count-event-dto';
import { countEventWhere } from './count-event-filter';

export async function listCounts(query: ListCountsQuery): Promise<{ counts: CountEventDto[]; total: number; page: number; pageSize: number }> {
  getDb();
  const where = countEventWhere(query, await siteTimeZone());
  const { rows, ...at } = await pageOfRows(CountEvent, { where, order: [['id', 'DESC']], page: query.page, pageSize: query.pageSize });
  return { counts: rows.map(toCountEventDto), ...at };
}
