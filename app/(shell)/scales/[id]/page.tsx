import Link from 'next/link';
import { notFound } from 'next/navigation';
import { can } from '@/lib/roles';
import { requirePageUser } from '@/server/auth/authorize';
import { orNotFound } from '@/server/http/or-not-found';
import { idParamSchema } from '@/lib/contracts/common';
import { listCalibrations } from '@/server/services/calibration/list-calibrations';
import { listTestWeights } from '@/server/services/calibration/test-weights';
import { getScale } from '@/server/services/scales/list-scales';
import { userNames } from '@/server/services/users/user-names';
import { formatGrams, formatNumber } from '../../../_components/format';
import { ScaleProfileForm } from '../_components/scale-profile-form';
import { ScaleStatus } from '../_components/scale-status';
import { TradeCaution } from '../_components/trade-caution';
import { CalibrationHistory } from './calibration-history';
import { LockScaleForm } from './lock-scale-form';
import { RecordTestForm } from './record-test-form';

export const metadata = { title: 'Scale' };

const CONNECTION_WORDS = { simulator: 'Simulator', serial: 'Serial line', raw_adc: 'Raw load-cell converter', keyed: 'Keyed in by hand' } as const;

export default async function ScalePage({ params }: { params: Promise<{ id: string }> }) {
  const raw = await params;
  const user = await requirePageUser('catalog.read', `/scales/${raw.id}`);
  const parsed = idParamSchema.safeParse(raw);
  if (!parsed.success) notFound();
  const scaleId = parsed.data.id;
  const scale = await orNotFound(getScale({ scaleId }));
  const records = await listCalibrations({ scaleId });
  const quality = can(user.role, 'calibration.manage');
  const [weights, names] = await Promise.all([quality ? listTestWeights() : Promise.resolve([]), userNames(records.map((r) => r.performedBy))]);
  const facts: Array<[string, string]> = [
    ['Max', formatGrams(scale.capacity)],
    ['Division d', formatGrams(scale.division)],
    ['Verification interval e', formatGrams(scale.verificationInterval)],
    ['Accuracy class', scale.accuracyClass],
    ['n = Max/e', formatNumber(scale.intervals)],
    ['Min', formatGrams(scale.minLoad)],
    ['Repeatability s_r', scale.repeatability === null ? 'not measured' : formatGrams(Number(scale.repeatability.toPrecision(3)))],
    ['Connection', CONNECTION_WORDS[scale.connection.kind]],
    ['Calibration due', scale.calibrationDueAt ?? 'not set'],
  ];
  return (
    <div className="space-y-6">
      <header className="space-y-2">
        <Link href="/scales" className="text-sm text-forge hover:underline">
          ← All scales
        </Link>
        <h1 className="page-title">{scale.name}</h1>
        <p className="text-ink-soft">{scale.location ?? 'No location recorded'}</p>
        <div className="text-base">
          <ScaleStatus scale={scale} withReason />
        </div>
      </header>
      <section aria-label="Metrology" className="card">
        <dl className="grid gap-x-6 gap-y-2 grid-cols-2 lg:grid-cols-3">
          {facts.map(([term, value]) => (
            <div key={term}>
              <dt className="text-sm text-ink-soft">{term}</dt>
              <dd className="num font-medium">{value}</dd>
            </div>
          ))}
        </dl>
        <p className="mt-3 text-xs text-ink-faint">Class limits for n and Min: OIML R 76-1 Table 3.</p>
      </section>
      {quality ? (
        <section aria-labelledby="record-title" className="space-y-3">
          <h2 id="record-title" className="text-lg font-bold">
            Record a test
          </h2>
          <RecordTestForm scale={scale} weights={weights} />
          <LockScaleForm scaleId={scale.id} locked={scale.status === 'locked'} />
        </section>
      ) : null}
      <section aria-labelledby="history-title" className="space-y-3">
        <h2 id="history-title" className="text-lg font-bold">
          Calibration history
        </h2>
        <CalibrationHistory records={records} names={names} />
      </section>
      {can(user.role, 'admin.manage') ? (
        <section aria-labelledby="profile-title" className="space-y-3">
          <h2 id="profile-title" className="text-lg font-bold">
            Profile
          </h2>
          <ScaleProfileForm scale={scale} />
        </section>
      ) : null}
      <TradeCaution />
    </div>
  );
}
