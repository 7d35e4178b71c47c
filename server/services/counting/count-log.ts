import 'server-only';
import type { WhereOptions } from 'sequelize';
import { Bin, BuildOrder, BuildOrderLine, CountEvent, Part, Scale, User } from '@/models';
import type { WarningCode } from '@/lib/weighing/warnings';
import { formatSiteDateTime } from '@/lib/time/site-clock';
import { getDb } from '../../db';
import type { CountLogQuery, CountLogRow } from '@/lib/contracts/counts';
import { siteTimeZone } from '../settings/get-settings';
import { countEventWhere } from './count-event-filter';
import { wholePieceRangeOf } from './count-event-dto';

export const COUNT_LOG_PAGE_SIZE = 100;
const EXPORT_LIMIT = 50_000;

type Loaded = CountEvent & {
  part: Part;
  scale: Scale;
  operator: User;
  orderLine: (BuildOrderLine & { order: BuildOrder }) | null;
  bin: Bin | null;
};

function findOptions(query: CountLogQuery, timeZone: string) {
  const where: WhereOptions<CountEvent> = { ...countEventWhere(query, timeZone), ...(query.notExact ? { exact: false } : {}) };
  return {
    where,
    include: [
      { model: Part, as: 'part', attributes: ['partNumber', 'description'], ...(query.partNumber ? { where: { partNumber: query.partNumber } } : {}) },
      { model: Scale, as: 'scale', attributes: ['name'] },
      { model: User, as: 'operator', attributes: ['name'] },
      { model: BuildOrderLine, as: 'orderLine', attributes: ['id'], include: [{ model: BuildOrder, as: 'order', attributes: ['id', 'number'] }] },
      { model: Bin, as: 'bin', attributes: ['code'] },
    ],
    order: [['id', 'DESC']] as [string, string][],
  };
}

function toRow(e: Loaded): CountLogRow {
  return {
    id: e.id,
    at: e.createdAt.toISOString(),
    purpose: e.purpose,
    partNumber: e.part.partNumber,
    description: e.part.description,
    scaleName: e.scale.name,
    operatorName: e.operator.name,
    orderId: e.orderLine?.order.id ?? null,
    orderNumber: e.orderLine?.order.number ?? null,
    binCode: e.bin?.code ?? null,
    net: Number(e.netG),
    sampleQuantity: e.sampleQuantity,
    averagePieceWeight: Number(e.apwG),
    count: e.count,
    expandedUncertainty: Number(e.expandedUncertainty),
    wholePieceRange: wholePieceRangeOf(e),
    exact: e.exact,
    targetQuantity: e.targetQuantity,
    warnings: (e.warnings as { code: WarningCode }[]).map((w) => w.code),
  };
}

// Who counted what, on which scale, with what uncertainty: newest first, a page at a time.
export async function countLog(query: CountLogQuery): Promise<{ rows: CountLogRow[]; total: number; page: number; pageSize: number }> {
  getDb();
  const page = query.page ?? 1;
  const { rows, count } = await CountEvent.findAndCountAll({
    ...findOptions(query, await siteTimeZone()),
    limit: COUNT_LOG_PAGE_SIZE,
    offset: (page - 1) * COUNT_LOG_PAGE_SIZE,
    distinct: true,
  });
  return { rows: (rows as Loaded[]).map(toRow), total: count, page, pageSize: COUNT_LOG_PAGE_SIZE };
}

const HEADER = [
  'counted_at_utc',
  'counted_at_site',
  'purpose',
  'part_number',
  'description',
  'scale',
  'counted_by',
  'order',
  'bin',
  'net_g',
  'sample_pcs',
  'apw_g',
  'count',
  'plus_minus_pcs',
  'expanded_uncertainty_pcs_k2',
  'exact',
  'target',
  'warnings',
];

// The same filters as the page, every page at once (up to 50 000 rows); warnings as their stable codes;
// the moment both as UTC (for machines) and as the site's clock read it (for people).
export async function countLogTable(query: CountLogQuery): Promise<{ header: readonly string[]; rows: unknown[][] }> {
  getDb();
  const timeZone = await siteTimeZone();
  const events = (await CountEvent.findAll({ ...findOptions(query, timeZone), limit: EXPORT_LIMIT })) as Loaded[];
  const rows = events
    .map(toRow)
    .map((r) => [
      r.at,
      formatSiteDateTime(r.at, timeZone),
      r.purpose,
      r.partNumber,
      r.description,
      r.scaleName,
      r.operatorName,
      r.orderNumber ?? '',
      r.binCode ?? '',
      r.net,
      r.sampleQuantity,
      r.averagePieceWeight,
      r.count,
      r.wholePieceRange,
      r.expandedUncertainty,
      r.exact ? 'yes' : 'no',
      r.targetQuantity ?? '',
      r.warnings.join(' '),
    ]);
  return { header: HEADER, rows };
}
