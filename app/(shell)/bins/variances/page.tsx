import Link from 'next/link';
import { can } from '@/lib/roles';
import { requirePageUser } from '@/server/auth/authorize';
import { getSettings } from '@/server/services/settings/get-settings';
import { pendingVariances } from '@/server/services/bins/pending-variances';
import { VarianceList } from './variance-list';

export const metadata = { title: 'Variances' };

export default async function VariancesPage() {
  const user = await requirePageUser('catalog.read', '/bins/variances');
  const [variances, settings] = await Promise.all([pendingVariances(), getSettings()]);
  const canDecide = can(user.role, 'variances.approve');
  return (
    <div className="space-y-6">
      <header className="space-y-2">
        <Link href="/bins" className="text-sm text-forge hover:underline">
          ← Bins
        </Link>
        <h1 className="page-title">Variances awaiting a decision</h1>
        <p className="text-ink-soft">
          Cycle counts that differ from the book by more than {settings.varianceThresholdPcs} pieces and {settings.varianceThresholdPct} % (the site limits)
          wait here.{' '}
          {canDecide
            ? 'Approving books the counted quantity; rejecting keeps the book and asks for a recount.'
            : 'A planner, quality engineer or administrator decides.'}
        </p>
      </header>
      <VarianceList initial={variances} canDecide={canDecide} meId={user.id} fourEyes={settings.fourEyesVariances} />
    </div>
  );
}
