import { can } from '@/lib/roles';
import { requirePageUser } from '@/server/auth/authorize';
import { listParts } from '@/server/services/parts/list-parts';
import { getSettings } from '@/server/services/settings/get-settings';
import { PartsBoard } from './parts-board';

export const metadata = { title: 'Parts' };

export default async function PartsPage({ searchParams }: { searchParams: Promise<{ q?: string | string[] }> }) {
  const user = await requirePageUser('catalog.read', '/parts');
  const raw = (await searchParams).q;
  const q = (Array.isArray(raw) ? raw[0] : raw)?.trim().slice(0, 80) || undefined;
  const [{ parts, total }, settings] = await Promise.all([listParts({ q, page: 1, pageSize: 500, sort: 'partNumber', dir: 'asc' }), getSettings()]);
  return (
    <div className="space-y-6">
      <header>
        <h1 className="page-title">Parts</h1>
        <p className="text-ink-soft">Every part the shop counts, with what the scales have learned about its piece weight.</p>
      </header>
      <PartsBoard parts={parts} total={total} q={q ?? ''} canEdit={can(user.role, 'parts.edit')} defaultSpread={settings.defaultPieceSpread} />
    </div>
  );
}
