import { z } from 'zod';
import { requirePageUser } from '@/server/auth/authorize';
import { accuracyReport, type ReportGrouping } from '@/server/services/audits/accuracy-report';
import { shiftDay, siteDay } from '@/lib/time/site-clock';
import { siteTimeZone } from '@/server/services/settings/get-settings';
import { AccuracyChart } from './accuracy-chart';
import { AccuracyTable } from './accuracy-table';

export const metadata = { title: 'Accuracy report' };

const GROUPINGS: Array<[ReportGrouping, string]> = [
  ['part', 'Part'],
  ['operator', 'Operator'],
  ['scale', 'Scale'],
  ['week', 'ISO week'],
];

// The period and grouping live in the URL, so a report can be bookmarked or sent on.
const querySchema = z.object({
  from: z.iso.date().optional().catch(undefined),
  to: z.iso.date().optional().catch(undefined),
  by: z.enum(['part', 'operator', 'scale', 'week']).catch('part'),
});

export default async function ReportsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await requirePageUser('audits.run', '/quality/reports');
  const q = querySchema.parse(await searchParams);
  const to = q.to ?? siteDay(await siteTimeZone());
  const from = q.from && q.from <= to ? q.from : shiftDay(to, -90);
  const rows = await accuracyReport({ from, to, by: q.by });
  const csv = `/api/v1/reports/accuracy?${new URLSearchParams({ from, to, by: q.by, format: 'csv' })}`;
  return (
    <div className="space-y-6">
      <header>
        <h1 className="page-title">Accuracy report</h1>
        <p className="text-ink-soft">How audited counts compared with the hand recount, for counts captured in the period.</p>
      </header>
      <form method="get" className="card grid gap-4 grid-cols-2 lg:grid-cols-[1fr_1fr_1fr_auto] lg:items-end" aria-label="Report period">
        <div>
          <label htmlFor="r-from" className="field-label">
            Counted from
          </label>
          <input id="r-from" name="from" type="date" className="field" defaultValue={from} />
        </div>
        <div>
          <label htmlFor="r-to" className="field-label">
            Counted to
          </label>
          <input id="r-to" name="to" type="date" className="field" defaultValue={to} />
        </div>
        <div>
          <label htmlFor="r-by" className="field-label">
            Group by
          </label>
          <select id="r-by" name="by" className="field" defaultValue={q.by}>
            {GROUPINGS.map(([value, label]) => (
              <option key={value} value={value}>
                {label}
              </option>
            ))}
          </select>
        </div>
        <div className="flex gap-2">
          <button type="submit" className="btn-primary">
            Show
          </button>
          <a href={csv} className="btn-quiet" download>
            Download CSV
          </a>
        </div>
      </form>
      {rows.length === 0 ? (
        <p className="card text-ink-soft">No recounts were keyed in for counts captured in this period.</p>
      ) : (
        <>
          <AccuracyChart rows={rows} />
          <AccuracyTable rows={rows} groupLabel={GROUPINGS.find(([g]) => g === q.by)![1]} />
        </>
      )}
      <p className="text-xs text-ink-faint">
        Error rate: share of recounts that differ at all. Nonconforming: hand count outside the count&apos;s own ± U, which is what an audit counts as a
        nonconforming item when it judges the lot by its ISO 2859-1 plan. Exact-flagged right: share of counts shown as exact that were.
      </p>
    </div>
  );
}
