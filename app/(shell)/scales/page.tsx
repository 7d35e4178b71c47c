import Link from 'next/link';
import { can } from '@/lib/roles';
import { requirePageUser } from '@/server/auth/authorize';
import { listScales } from '@/server/services/scales/list-scales';
import { formatGrams, formatNumber } from '../../_components/format';
import { ScaleProfileForm } from './_components/scale-profile-form';
import { ScaleStatus } from './_components/scale-status';
import { TradeCaution } from './_components/trade-caution';

export const metadata = { title: 'Scales' };

export default async function ScalesPage() {
  const user = await requirePageUser('catalog.read', '/scales');
  const scales = await listScales();
  return (
    <div className="space-y-6">
      <header>
        <h1 className="page-title">Scales</h1>
        <p className="text-ink-soft">Every scale on the floor, its metrology and whether it may be used for counting today.</p>
      </header>
      <div className="card p-0 overflow-x-auto">
        <table className="w-full text-sm" aria-label="Scales">
          <thead className="bg-paper-deep text-left text-ink-soft">
            <tr>
              <th scope="col" className="px-3 py-2">
                Scale
              </th>
              <th scope="col" className="px-3 py-2">
                Status
              </th>
              <th scope="col" className="px-3 py-2">
                Calibration due
              </th>
              <th scope="col" className="px-3 py-2 text-right">
                Max
              </th>
              <th scope="col" className="px-3 py-2 text-right">
                d
              </th>
              <th scope="col" className="px-3 py-2 text-right">
                e
              </th>
              <th scope="col" className="px-3 py-2">
                Class
              </th>
              <th scope="col" className="px-3 py-2 text-right">
                n
              </th>
              <th scope="col" className="px-3 py-2 text-right">
                Min
              </th>
            </tr>
          </thead>
          <tbody>
            {scales.map((s) => (
              <tr key={s.id} className="border-t border-paper-line align-top" data-testid={`scale-row-${s.id}`}>
                <td className="px-3 py-2.5">
                  <Link href={`/scales/${s.id}`} className="font-medium text-forge hover:underline whitespace-nowrap">
                    {s.name}
                  </Link>
                  <span className="block text-ink-faint">{s.location ?? 'no location'}</span>
                </td>
                <td className="px-3 py-2.5 min-w-44">
                  <ScaleStatus scale={s} withReason />
                </td>
                <td className="px-3 py-2.5 num whitespace-nowrap">{s.calibrationDueAt ?? 'not set'}</td>
                <td className="px-3 py-2.5 num text-right whitespace-nowrap">{formatGrams(s.capacity)}</td>
                <td className="px-3 py-2.5 num text-right whitespace-nowrap">{formatGrams(s.division)}</td>
                <td className="px-3 py-2.5 num text-right whitespace-nowrap">{formatGrams(s.verificationInterval)}</td>
                <td className="px-3 py-2.5">{s.accuracyClass}</td>
                <td className="px-3 py-2.5 num text-right">{formatNumber(s.intervals)}</td>
                <td className="px-3 py-2.5 num text-right whitespace-nowrap">{formatGrams(s.minLoad)}</td>
              </tr>
            ))}
          </tbody>
        </table>
        {scales.length === 0 ? <p className="p-4 text-ink-soft">No scales yet.</p> : null}
      </div>
      <p className="text-xs text-ink-faint">n = Max/e and Min follow OIML R 76-1 Table 3 for the scale's accuracy class.</p>
      {can(user.role, 'admin.manage') ? (
        <section aria-labelledby="new-scale-title" className="space-y-3">
          <h2 id="new-scale-title" className="text-lg font-bold">
            Add a scale
          </h2>
          <ScaleProfileForm />
        </section>
      ) : null}
      <TradeCaution />
    </div>
  );
}
