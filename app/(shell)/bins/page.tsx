import { firstValues, pageHref } from '@/lib/page-range';
import { can } from '@/lib/roles';
import { requirePageUser } from '@/server/auth/authorize';
import { listBinsSchema } from '@/lib/contracts/bins';
import { binsDue } from '@/server/services/bins/bins-due';
import { latestBinCounts } from '@/server/services/bins/latest-bin-counts';
import { listBins } from '@/server/services/bins/list-bins';
import { listContainers } from '@/server/services/containers/list-containers';
import { listParts } from '@/server/services/parts/list-parts';
import { Pager } from '../../_components/pager';
import { BinBoard } from './bin-board';
import { BinForm } from './bin-form';
import { CycleCountPlan } from './cycle-count-plan';

export const metadata = { title: 'Bins' };

export default async function BinsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageUser('catalog.read', '/bins');
  const parsed = listBinsSchema.pick({ q: true, page: true }).safeParse(firstValues(await searchParams));
  const { q, page } = parsed.success ? parsed.data : { q: undefined, page: 1 };
  const [list, due] = await Promise.all([listBins({ q, page, pageSize: 100 }), binsDue()]);
  const last = await latestBinCounts(list.bins.map((b) => b.id));
  const rows = list.bins.map((b) => ({ ...b, lastVariance: last[b.id] ?? null }));
  const editor = can(user.role, 'bins.edit');
  const [parts, containers] = editor
    ? await Promise.all([listParts({ page: 1, pageSize: 500, sort: 'partNumber', dir: 'asc' }), listContainers()])
    : [null, []];
  return (
    <div className="space-y-6">
      <header>
        <h1 className="page-title">Bins</h1>
        <p className="text-ink-soft">Book quantities by location, what is due for a cycle count, and how the last count compared.</p>
      </header>
      <CycleCountPlan bins={due} canCount={can(user.role, 'counts.capture')} />
      <BinBoard list={{ ...list, bins: rows }} q={q ?? ''} canCount={can(user.role, 'counts.capture')} canPrint={can(user.role, 'labels.print')} />
      <Pager label="Pages of the bins" at={list} shown={rows.length} hrefFor={(p) => pageHref('/bins', { q }, p)} />
      {editor && parts ? (
        <section aria-labelledby="new-bin-title" className="space-y-3">
          <h2 id="new-bin-title" className="text-lg font-bold">
            Add a bin
          </h2>
          <BinForm parts={parts.parts.map((p) => ({ id: p.id, partNumber: p.partNumber }))} containers={containers.map((c) => ({ id: c.id, name: c.name }))} />
        </section>
      ) : null}
    </div>
  );
}
