import { describeWarning, type WarningCode } from '@/lib/weighing/warnings';

// Codes that change what the number means get the strong look; the rest are advice.
const STRONG: ReadonlySet<WarningCode> = new Set(['apw_below_resolution', 'count_not_exact', 'over_capacity', 'scale_locked', 'unstable']);

export function WarningList({ codes }: { codes: readonly WarningCode[] }) {
  if (codes.length === 0) return null;
  return (
    <ul aria-label="Warnings" className="space-y-2" aria-live="polite">
      {codes.map((code) => {
        const { message, remedy } = describeWarning(code);
        const strong = STRONG.has(code);
        return (
          <li
            key={code}
            data-warning={code}
            className={`rounded-md border-l-8 px-4 py-3 ${strong ? 'border-fault bg-fault-light' : 'border-caution bg-caution-light'}`}
          >
            <p className={`font-bold ${strong ? 'text-lg text-fault' : 'text-caution'}`}>
              <span aria-hidden="true">{strong ? '▲ ' : '● '}</span>
              {message}
            </p>
            <p className="text-ink-soft">What to do: {remedy}</p>
          </li>
        );
      })}
    </ul>
  );
}
