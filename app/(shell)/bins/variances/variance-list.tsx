'use client';

import { useState } from 'react';
import type { PendingVariance } from '@/lib/contracts/bins';
import { useSiteTime } from '../../../_components/site-time';
import { VarianceDecision } from './variance-decision';

export function VarianceList({ initial, canDecide, meId, fourEyes }: { initial: PendingVariance[]; canDecide: boolean; meId: number; fourEyes: boolean }) {
  const { when } = useSiteTime();
  const [pending, setPending] = useState(initial);
  const [notice, setNotice] = useState<string | null>(null);
  return (
    <div className="space-y-3">
      <p role="status" aria-live="polite" className={notice ? 'text-sm text-ok' : 'sr-only'} data-testid="variance-notice">
        {notice}
      </p>
      {pending.length === 0 ? <p className="card text-ink-soft">No variances are waiting.</p> : null}
      <ul className="grid gap-3 lg:grid-cols-2">
        {pending.map((v) => (
          <li key={v.id} className="card space-y-3" data-testid={`variance-${v.binCode}`}>
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <h2 className="font-bold">
                <span className="num">{v.binCode}</span> · {v.partNumber}
              </h2>
              <span className={`num rounded px-2 py-0.5 text-sm font-medium ${v.variance < 0 ? 'bg-fault-light text-fault' : 'bg-caution-light text-caution'}`}>
                {v.variance > 0 ? '+' : ''}
                {v.variance} pcs{v.percent === null ? '' : ` (${v.percent} %)`}
              </span>
            </div>
            <p className="text-sm">
              Book <span className="num font-medium">{v.bookQuantity}</span> → counted <span className="num font-medium">{v.counted}</span>
              <span className="block text-ink-faint">
                by {v.countedBy}, {when(v.countedAt)}
              </span>
            </p>
            {canDecide && fourEyes && v.countedById === meId ? (
              <p className="text-sm text-ink-soft" data-testid="own-variance">
                You counted this bin: someone else approves or rejects it (four eyes).
              </p>
            ) : canDecide ? (
              <VarianceDecision
                variance={v}
                onDecided={(text) => {
                  setPending((list) => list.filter((x) => x.id !== v.id));
                  setNotice(text);
                }}
              />
            ) : null}
          </li>
        ))}
      </ul>
    </div>
  );
}
