import Link from 'next/link';
import { notFound } from 'next/navigation';
import { requirePageUser } from '@/server/auth/authorize';
import { orNotFound } from '@/server/http/or-not-found';
import { idParamSchema } from '@/lib/contracts/common';
import { getAudit } from '@/server/services/audits/get-audit';
import { listScales } from '@/server/services/scales/list-scales';
import { userNames } from '@/server/services/users/user-names';
import { AuditRecount } from './audit-recount';

export const metadata = { title: 'Count audit' };

export default async function AuditPage({ params }: { params: Promise<{ id: string }> }) {
  const raw = await params;
  await requirePageUser('audits.run', `/quality/audits/${raw.id}`);
  const parsed = idParamSchema.safeParse(raw);
  if (!parsed.success) notFound();
  const audit = await orNotFound(getAudit({ auditId: parsed.data.id }));
  const [scales, names] = await Promise.all([listScales(), userNames(audit.items.map((i) => i.operatorId))]);
  const scaleNames = Object.fromEntries(scales.map((s) => [s.id, s.name]));
  const p = audit.population;
  const filters = [p.purpose && `kind ${p.purpose.replace('_', ' ')}`, p.partId && `one part`, p.operatorId && `one operator`, p.scaleId && `one scale`]
    .filter(Boolean)
    .join(', ');
  return (
    <div className="space-y-6">
      <header className="space-y-2">
        <Link href="/quality/audits" className="text-sm text-forge hover:underline">
          ← All audits
        </Link>
        <h1 className="page-title">Audit {audit.id}</h1>
        <p className="text-ink-soft">
          A lot of {audit.lotSize} counts captured {p.from} to {p.to}
          {filters ? ` (${filters})` : ''}. ISO 2859-1, level {audit.level}, AQL {audit.aql}: code letter {audit.codeLetter}, sample {audit.sampleSize}, accept
          with at most {audit.accept} nonconforming, reject at {audit.reject}.
        </p>
        <p className="text-sm text-ink-faint" data-testid="audit-seed">
          Sample drawn with seed {audit.seed}; the same seed and population draw the same counts again.
        </p>
      </header>
      <AuditRecount initial={audit} scaleNames={scaleNames} operatorNames={names} />
    </div>
  );
}
