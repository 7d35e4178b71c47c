import { can } from '@/lib/roles';
import { firstValues, pageHref } from '@/lib/page-range';
import { requirePageUser } from '@/server/auth/authorize';
import { listPartsSchema } from '@/lib/contracts/parts';
import { listHeldSamples } from '@/server/services/parts/held-samples';
import { listParts } from '@/server/services/parts/list-parts';
import { getSettings } from '@/server/services/settings/get-settings';
import { Pager } from '../../_components/pager';
import { HeldSamples } from './held-samples';
import { PartsBoard } from './parts-board';

export const metadata = { title: 'Parts' };

export default async function PartsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageUser('catalog.read', '/parts');
  const parsed = listPartsSchema.pick({ q: true, page: true }).safeParse(firstValues(await searchParams));
  const { q, page } = parsed.success ? { q: parsed.data.q || undefined, page: parsed.data.page } : { q: undefined, page: 1 };
  const canDecide = can(user.role, 'variances.approve');
  const [list, settings, held] = await Promise.all([
    listParts({ q, page, pageSize: 100, sort: 'partNumber', dir: 'asc' }),
    getSettings(),
    canDecide ? listHeldSamples() : Promise.resolve([]),
  ]);
  return (
    <div className="space-y-6">
      <header>
        <h1 className="page-title">Parts</h1>
        <p className="text-ink-soft">Every part the shop counts, with what the scales have learned about its piece weight.</p>
      </header>
      <HeldSamples samples={held} />
      <PartsBoard list={list} q={q ?? ''} canEdit={can(user.role, 'parts.edit')} defaultSpread={settings.defaultPieceSpread} />
      <Pager label="Pages of the parts" at={list} shown={list.parts.length} hrefFor={(p) => pageHref('/parts', { q }, p)} />
    </div>
  );
}
