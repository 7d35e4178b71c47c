import Link from 'next/link';
import { COUNT_PURPOSE_LABELS } from '@/lib/count-purposes';
import { COUNT_PURPOSES } from '@/lib/domain/counting';
import { requirePageUser } from '@/server/auth/authorize';
import { zodFields } from '@/server/http/zod-fields';
import { countLogQuerySchema, type CountLogQuery } from '@/lib/contracts/counts';
import { countLog } from '@/server/services/counting/count-log';
import { listScales } from '@/server/services/scales/list-scales';
import { firstValues, pageHref, rangeText } from '@/lib/page-range';
import { Pager } from '../../_components/pager';
import { CountLogGrid } from './count-log-grid';

export const metadata = { title: 'Count log' };

type Search = Record<string, string | string[] | undefined>;

export default async function CountLogPage({ searchParams }: { searchParams: Promise<Search> }) {
  await requirePageUser('catalog.read', '/counts');
  const parsed = countLogQuerySchema.safeParse(firstValues(await searchParams));
  const query: CountLogQuery = parsed.success ? parsed.data : {};
  const problems = parsed.success ? [] : Object.values(zodFields(parsed.error));
  const [{ rows, total, page, pageSize }, scales] = await Promise.all([countLog(query), listScales()]);
  return (
    <div className="space-y-5">
      <header>
        <h1 className="page-title">Count log</h1>
        <p className="text-ink-soft">Every capture from the benches, newest first: what was counted, on which scale, by whom, and how sure the count is.</p>
      </header>
      <form method="get" action="/counts" role="search" aria-label="Filter the count log" className="card flex flex-wrap items-end gap-3">
        <div>
          <label htmlFor="log-part" className="field-label">
            Part number
          </label>
          <input id="log-part" name="partNumber" defaultValue={query.partNumber ?? ''} className="field w-52 num" placeholder="Any part" />
        </div>
        <div>
          <label htmlFor="log-purpose" className="field-label">
            Counted for
          </label>
          <select id="log-purpose" name="purpose" defaultValue={query.purpose ?? ''} className="field">
            <option value="">Anything</option>
            {COUNT_PURPOSES.map((p) => (
              <option key={p} value={p}>
                {COUNT_PURPOSE_LABELS[p]}
              </option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor="log-scale" className="field-label">
            Scale
          </label>
          <select id="log-scale" name="scaleId" defaultValue={query.scaleId ?? ''} className="field">
            <option value="">Any scale</option>
            {scales.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
              </option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor="log-from" className="field-label">
            From (UTC day)
          </label>
          <input id="log-from" name="from" type="date" defaultValue={query.from ?? ''} className="field" />
        </div>
        <div>
          <label htmlFor="log-to" className="field-label">
            To (UTC day)
          </label>
          <input id="log-to" name="to" type="date" defaultValue={query.to ?? ''} className="field" />
        </div>
        <label className="flex items-center gap-2 pb-2">
          <input type="checkbox" name="notExact" value="1" defaultChecked={query.notExact === '1'} className="h-5 w-5" />
          Only counts that were not exact
        </label>
        <button type="submit" className="btn-primary">
          Show
        </button>
        <Link href="/counts" className="btn-quiet">
          Clear
        </Link>
      </form>
      {problems.length ? (
        <p role="alert" className="rounded-md border-l-8 border-fault bg-fault-light px-4 py-3" data-testid="log-problems">
          These filters were not understood, so the whole log is shown: {problems.join('; ')}.
        </p>
      ) : null}
      <div className="flex flex-wrap items-center gap-3">
        <p role="status" className="text-sm text-ink-soft" data-testid="log-summary">
          {`${rangeText({ total, page, pageSize }, rows.length, ['count', 'counts'], 'No counts match')}.`}
        </p>
        <a className="btn-quiet" href={pageHref('/api/v1/counts/export', query, 1)} download>
          Download CSV
        </a>
      </div>
      <CountLogGrid rows={rows} />
      <Pager
        label="Pages of the count log"
        at={{ total, page, pageSize }}
        shown={rows.length}
        hrefFor={(p) => pageHref('/counts', query, p)}
        earlier="Newer"
        later="Older"
      />
      <p className="text-sm text-ink-faint">
        ± is the expanded uncertainty of the count (k = 2, about 95 %). A count is exact when that range is under half a piece. Counts used to sell goods by
        number need a legally verified scale; see the cautions on Today.
      </p>
    </div>
  );
}
