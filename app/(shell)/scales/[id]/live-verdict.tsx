import type { CalibrationVerdict } from '@/lib/metrology/evaluate-calibration';
import { formatGrams } from '../../../_components/format';

const mark = (pass: boolean) => (pass ? <span className="text-ok">✓ within</span> : <span className="text-fault">✕ beyond</span>);

// The verdict of the weighing checks before saving. Zero, tare and the test weights are judged on save.
export function LiveVerdict({
  verdict,
  problem,
  zeroOk,
  tareOk,
}: {
  verdict: CalibrationVerdict | null;
  problem: string | null;
  zeroOk: boolean;
  tareOk: boolean;
}) {
  if (problem) return <p className="rounded-md bg-fault-light px-3 py-2 text-sm text-fault">{problem}</p>;
  if (!verdict)
    return (
      <p className="text-sm text-ink-faint" data-testid="live-verdict">
        Enter an indication for every load to see the verdict.
      </p>
    );
  const pass = verdict.pass && zeroOk && tareOk;
  return (
    <div
      className={`rounded-md border p-3 text-sm ${pass ? 'border-ok bg-ok-light' : 'border-fault bg-fault-light'}`}
      data-testid="live-verdict"
      aria-live="polite"
    >
      <p className={`font-bold ${pass ? 'text-ok' : 'text-fault'}`}>
        {pass ? 'Would pass: the scale goes back in service' : 'Would fail: the scale will be locked out'}
      </p>
      <ul className="mt-1 space-y-0.5 num">
        {verdict.points.map((p, i) => (
          <li key={i}>
            {formatGrams(p.load)}: error {p.error > 0 ? '+' : ''}
            {formatGrams(p.error)}, MPE ± {formatGrams(p.mpe)} <span className="font-sans">{mark(p.pass)}</span>
          </li>
        ))}
        {verdict.repeatability ? (
          <li>
            Repeatability range {formatGrams(verdict.repeatability.range)} of ± {formatGrams(verdict.repeatability.mpe)}{' '}
            <span className="font-sans">{mark(verdict.repeatability.pass)}</span>
          </li>
        ) : null}
        {verdict.eccentricity ? (
          <li>
            Eccentricity {formatGrams(verdict.eccentricity.maxError)} of ± {formatGrams(verdict.eccentricity.mpe)}{' '}
            <span className="font-sans">{mark(verdict.eccentricity.pass)}</span>
          </li>
        ) : null}
      </ul>
      {!zeroOk || !tareOk ? (
        <p className="mt-1 text-fault">{[!zeroOk && 'zero', !tareOk && 'tare'].filter(Boolean).join(' and ')} check marked as failed</p>
      ) : null}
      <p className="mt-1 text-xs text-ink-soft">
        MPEs from OIML R 76-1 Table 6 (doubled in service, 3.5.2); test weights are checked against their certificates and 1/3 of the MPE when you save.
      </p>
    </div>
  );
}
