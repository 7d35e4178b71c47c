import { can } from '@/lib/roles';
import { requirePageUser } from '@/server/auth/authorize';
import { listHeldSamples } from '@/server/services/parts/held-samples';
import { listParts } from '@/server/services/parts/list-parts';
import { getSettings } from '@/server/services/settings/get-settings';
import { HeldSamples } from './held-samples';
import { PartsBoard } from './parts-board';

export const metadata = { title: 'Parts' };

export default async function PartsPage({ searchParams }: { searchParams: Promise<{ q?: string | string[] }> }) {
  const user = await requirePageUser('catalog.read', '/parts');
  const raw = (await searchParams).q;
  const q = (Array.isArray(raw) ? raw[0] : raw)?.trim().slice(0, 80) || undefined;
  const canDecide = can(user.role, 'variances.approve');
  const [{ parts, total }, settings, held] = await Promise.all([
    listParts({ q, page: 1, pageSize: 500, sort: 'partNumber', dir: 'asc' }),
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
      <PartsBoard parts={parts} total={total} q={q ?? ''} canEdit={can(user.role, 'parts.edit')} defaultSpread={settings.defaultPieceSpread} />
    </div>
  );
}
