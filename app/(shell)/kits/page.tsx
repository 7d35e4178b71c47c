import { can } from '@/lib/roles';
import { requirePageUser } from '@/server/auth/authorize';
import { listKits } from '@/server/services/kits/list-kits';
import { KitsBoard } from './kits-board';

export const metadata = { title: 'Kits' };

export default async function KitsPage() {
  const user = await requirePageUser('catalog.read', '/kits');
  const kits = await listKits();
  return (
    <div className="space-y-6">
      <header>
        <h1 className="page-title">Kits</h1>
        <p className="text-ink-soft">
          Bills of material: which parts, how many per kit, and how far a count may stray. A revision that orders were released from keeps its parts; copy it to
          change them.
        </p>
      </header>
      <KitsBoard kits={kits} canEdit={can(user.role, 'kits.edit')} />
    </div>
  );
}
