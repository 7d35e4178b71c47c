'use client';

import { CYCLE_DAYS } from '@/lib/variance';
import type { BinDto } from '@/lib/contracts/bins';
import { useSiteTime } from '../../_components/site-time';
import { BenchLink } from './bench-link';

// Bins due by their ABC class interval; the intervals are common practice, not a standard.
export function CycleCountPlan({ bins, canCount }: { bins: BinDto[]; canCount: boolean }) {
  const { when } = useSiteTime();
  return (
    <section aria-labelledby="due-title" className="card">
      <h2 id="due-title" className="font-bold">
        Due for a cycle count <span className="num text-forge">({bins.length})</span>
      </h2>
      <p className="text-sm text-ink-faint">
        Class A every {CYCLE_DAYS.A} days, B every {CYCLE_DAYS.B}, C every {CYCLE_DAYS.C} (common practice; never-counted bins first).
      </p>
      {bins.length ? (
        <ul className="mt-3 divide-y divide-paper-line" data-testid="bins-due">
          {bins.slice(0, 12).map((b) => (
            <li key={b.id} className="flex flex-wrap items-center justify-between gap-x-4 gap-y-1 py-2">
              <span>
                <span className="num font-medium">{b.code}</span> · {b.partNumber} · class {b.abcClass}
                <span className="block text-sm text-ink-faint">{b.lastCountedAt ? `last counted ${when(b.lastCountedAt)}` : 'never counted'}</span>
              </span>
              {canCount ? <BenchLink code={b.code} /> : null}
            </li>
          ))}
        </ul>
      ) : (
        <p className="mt-2 text-ink-soft">Every bin has been counted within its interval.</p>
      )}
      {bins.length > 12 ? <p className="mt-2 text-sm text-ink-faint">and {bins.length - 12} more, oldest first.</p> : null}
    </section>
  );
}
