import 'server-only';
import { Op } from 'sequelize';
import { AuditItem, CountEvent, Part, Scale, User } from '@/models';
import { judgeAuditItem } from '@/lib/sampling/judge-audit';
import { dayRange, siteIsoWeek } from '@/lib/time/site-clock';
import { siteTimeZone } from '../settings/get-settings';
import { wholePieceRangeOf } from '../counting/count-event-dto';
import { getDb } from '../../db';

export type ReportGrouping = 'part' | 'operator' | 'scale' | 'week';

export interface AccuracyRow {
  key: string;
  label: string;
  recounts: number;
  nonconforming: number;
  errorRate: number;
  meanAbsError: number;
  meanAbsErrorPct: number;
  exactFlagged: number;
  exactRight: number;
  exactRightShare: number | null;
}

// Every recount keyed in, grouped; counts captured between from and to (whole days at the site,
// and weeks are the site's ISO 8601 weeks).
export async function accuracyReport({ from, to, by }: { from: string; to: string; by: ReportGrouping }): Promise<AccuracyRow[]> {
  getDb();
  const timeZone = await siteTimeZone();
  const { start, end } = dayRange({ from, to }, timeZone);
  const items = await AuditItem.findAll({
    where: { handCount: { [Op.ne]: null } },
    include: [
      {
        model: CountEvent,
        as: 'event',
        where: { createdAt: { [Op.gte]: start!, [Op.lt]: end! } },
        include: [
          { model: Part, as: 'part' },
          { model: Scale, as: 'scale' },
          { model: User, as: 'operator' },
        ],
      },
    ],
  });
  const groups = new Map<string, { label: string; rows: Array<ReturnType<typeof judgeAuditItem> & { hand: number }> }>();
  for (const item of items) {
    const e = (item as AuditItem & { event: CountEvent & { part: Part; scale: Scale; operator: User } }).event;
    const [key, label] =
      by === 'part'
        ? [String(e.partId), e.part.partNumber]
        : by === 'scale'
          ? [String(e.scaleId), e.scale.name]
          : by === 'operator'
            ? [String(e.operatorId), e.operator.name]
            : [siteIsoWeek(e.createdAt, timeZone), siteIsoWeek(e.createdAt, timeZone)];
    const judged = judgeAuditItem({ count: e.count, wholePieceRange: wholePieceRangeOf(e), exact: e.exact, handCount: item.handCount! });
    const group = groups.get(key) ?? { label, rows: [] };
    group.rows.push({ ...judged, hand: item.handCount! });
    groups.set(key, group);
  }
  return [...groups.entries()]
    .map(([key, { label, rows }]) => {
      const n = rows.length;
      const exact = rows.filter((r) => r.exactRight !== null);
      const round = (x: number) => Math.round(x * 1000) / 1000;
      return {
        key,
        label,
        recounts: n,
        nonconforming: rows.filter((r) => !r.withinUncertainty).length,
        errorRate: round(rows.filter((r) => r.error !== 0).length / n),
        meanAbsError: round(rows.reduce((a, r) => a + Math.abs(r.error), 0) / n),
        meanAbsErrorPct: round((rows.reduce((a, r) => a + (r.hand > 0 ? Math.abs(r.error) / r.hand : 0), 0) / n) * 100),
        exactFlagged: exact.length,
        exactRight: exact.filter((r) => r.exactRight).length,
        exactRightShare: exact.length ? round(exact.filter((r) => r.exactRight).length / exact.length) : null,
      };
    })
    .sort((a, b) => a.label.localeCompare(b.label));
}
