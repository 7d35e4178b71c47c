import type { AuditItemDto } from '@/lib/contracts/audits';

// One recount judged: inside count ± U (whole pieces) conforms; an "exact" flag must be exactly right.
export function ItemVerdict({ item }: { item: AuditItemDto }) {
  if (item.handCount === null || item.error === null) return <span className="text-ink-faint">waiting</span>;
  const off = item.error === 0 ? 'no difference' : `scale ${item.error > 0 ? 'over' : 'under'} by ${Math.abs(item.error)} pcs`;
  return (
    <span className="flex flex-col">
      {item.withinUncertainty ? <span className="font-medium text-ok">✓ within ± U</span> : <span className="font-medium text-fault">✕ outside ± U</span>}
      <span className="text-ink-faint">{off}</span>
      {item.exactRight === false ? <span className="text-fault">flagged exact but was not</span> : null}
    </span>
  );
}
