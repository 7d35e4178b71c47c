import type { AuditDto } from '@/lib/contracts/audits';

// The lot's state in words and colour: open, accepted or rejected.
export function AuditVerdict({ status, verdict }: Pick<AuditDto, 'status' | 'verdict'>) {
  if (status === 'open') return <span className="rounded bg-brass-light px-2 py-0.5 text-sm font-medium text-brass-dark">◐ recount open</span>;
  return verdict === 'accepted' ? (
    <span className="rounded bg-ok-light px-2 py-0.5 text-sm font-medium text-ok">✓ lot accepted</span>
  ) : (
    <span className="rounded bg-fault-light px-2 py-0.5 text-sm font-medium text-fault">✕ lot rejected</span>
  );
}
