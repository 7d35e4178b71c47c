import Link from 'next/link';
import { can } from '@/lib/roles';
import { requirePageUser } from '@/server/auth/authorize';
import { listAudits } from '@/server/services/audits/get-audit';
import { listParts } from '@/server/services/parts/list-parts';
import { listScales } from '@/server/services/scales/list-scales';
import { listUsers } from '@/server/services/users/list-users';
import { shiftDay, siteDay } from '@/lib/time/site-clock';
import { siteTimeZone } from '@/server/services/settings/get-settings';
import { AuditVerdict } from './audit-verdict';
import { CreateAuditForm } from './create-audit-form';
import { SamplingPlanCalculator } from './sampling-plan-calculator';

export const metadata = { title: 'Count audits' };

export default async function AuditsPage() {
  await requirePageUser('audits.run', '/quality/audits');
  const [audits, parts, scales, users] = await Promise.all([
    listAudits(),
    listParts({ page: 1, pageSize: 500, sort: 'partNumber', dir: 'asc' }),
    listScales(),
    listUsers(),
  ]);
  const today = siteDay(await siteTimeZone());
  return (
    <div className="space-y-6">
      <header>
        <h1 className="page-title">Count audits</h1>
        <p className="text-ink-soft">Recount a random sample of captured counts by hand and judge the lot against an ISO 2859-1 plan.</p>
      </header>
      <div className="grid gap-6 xl:grid-cols-2">
        <SamplingPlanCalculator />
        <CreateAuditForm
          parts={parts.parts.map((p) => ({ id: p.id, label: p.partNumber }))}
          operators={users.filter((u) => can(u.role, 'counts.capture')).map((u) => ({ id: u.id, label: u.name }))}
          scales={scales.map((s) => ({ id: s.id, label: s.name }))}
          today={today}
          monthAgo={shiftDay(today, -30)}
        />
      </div>
      <section aria-labelledby="audits-title" className="space-y-3">
        <h2 id="audits-title" className="text-lg font-bold">
          Audits
        </h2>
        {audits.length === 0 ? <p className="card text-ink-soft">No audits yet.</p> : null}
        <ul className="grid gap-3 sm:grid-cols-2 xl:grid-cols-3">
          {audits.map((a) => (
            <li key={a.id}>
              <Link href={`/quality/audits/${a.id}`} className="card block hover:border-forge" data-testid={`audit-${a.id}`}>
                <span className="flex items-baseline justify-between gap-2">
                  <span className="font-bold">Audit {a.id}</span>
                  <AuditVerdict status={a.status} verdict={a.verdict} />
                </span>
                <span className="block text-sm text-ink-soft">
                  Counts from {a.population.from} to {a.population.to}
                </span>
                <span className="block num text-sm">
                  lot {a.lotSize} · {a.codeLetter} · n {a.sampleSize} · Ac {a.accept} / Re {a.reject}
                </span>
                <span className="block text-sm text-ink-faint">
                  {a.counted} of {a.sampleSize} recounted
                </span>
              </Link>
            </li>
          ))}
        </ul>
      </section>
    </div>
  );
}
