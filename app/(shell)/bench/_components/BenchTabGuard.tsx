'use client';

import type { ReactNode } from 'react';
import { useBenchTabLock } from './use-bench-tab-lock';

// Shows the bench only in the tab that holds it; any other tab says where the bench is and offers to move it here.
export function BenchTabGuard({ children }: { children: ReactNode }) {
  const { state, takeOver } = useBenchTabLock();
  if (state === 'held') return <>{children}</>;
  if (state === 'checking')
    return (
      <p className="text-ink-soft" data-testid="bench-tab">
        Opening the bench…
      </p>
    );
  return (
    <section aria-labelledby="bench-tab-title" className="card max-w-2xl space-y-3 border-l-8 border-caution" data-testid="bench-tab">
      <h1 id="bench-tab-title" className="page-title">
        {state === 'taken' ? 'The bench moved to another tab' : 'The bench is open in another tab'}
      </h1>
      <p>
        This browser keeps the count in progress and any captures waiting to be sent. Two bench tabs would write over each other&rsquo;s work, so only one
        counts at a time. {state === 'taken' ? 'Another tab took the bench over.' : 'Another tab or window of this browser has it.'}
      </p>
      <p className="text-ink-soft">Close the other tab and the bench comes back here by itself, or move it here now. A count in progress is kept.</p>
      <button type="button" className="btn-primary" onClick={takeOver}>
        Count here instead
      </button>
    </section>
  );
}
