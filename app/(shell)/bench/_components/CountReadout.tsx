import { formatWeight } from '@/lib/weighing/display-decimals';
import type { ToleranceVerdict } from '@/lib/weighing/tolerance';
import type { LiveFrame } from '../_lib/reading-pipeline';

interface Props {
  frame: LiveFrame | null;
  /** Scale division d (g): weights show its decimals; 1 g when no scale is chosen. */
  division: number;
  /** What the big number is: a weight before the sample, pieces after. */
  showing: 'gross' | 'net' | 'count';
  targetQuantity: number | null;
  verdict: ToleranceVerdict | null;
}

const VERDICT_TEXT: Record<ToleranceVerdict, { text: string; cls: string }> = {
  in: { text: 'Within tolerance', cls: 'bg-ok text-white' },
  uncertain: { text: 'Uncertain — the ± range leaves the tolerance', cls: 'bg-caution text-white' },
  out: { text: 'Outside tolerance', cls: 'bg-fault text-white' },
};

// The number the operator reads from across the bench: very large mono digits, the unit in words.
// It stays pinned to the top of the window while the steps or the practice pan scroll beneath it.
export function CountReadout({ frame, division, showing, targetQuantity, verdict }: Props) {
  const est = frame?.estimate ?? null;
  const u = est ? est.wholePieceRange : 0;
  const weight = frame ? (showing === 'gross' ? frame.gross : frame.net) : null;
  return (
    <section aria-label="Live reading" className="sticky top-0 z-20 rounded-lg bg-ink p-5 text-paper">
      <div className="flex items-center justify-between text-sm">
        <span data-testid="stability" className={`rounded-full px-3 py-1 font-bold ${frame?.stable ? 'bg-ok text-white' : 'bg-ink-soft text-paper'}`}>
          {frame ? (frame.stable ? 'Settled' : 'Settling…') : 'No readings'}
        </span>
        <span className="num text-paper-line" data-testid="gross">
          gross {frame ? formatWeight(frame.gross, division) : '–'} g
        </span>
      </div>
      {showing === 'count' && est ? (
        <div className="mt-2" data-testid="live-count" data-count={est.count} data-exact={String(est.exact)}>
          <p className="num text-[6rem] leading-none font-bold sm:text-[8rem]">
            {est.count}
            {!est.exact ? <span className="text-[3rem] text-brass sm:text-[4rem]"> ± {u}</span> : null}
            <span className="ml-3 text-3xl font-normal text-paper-line">pcs</span>
          </p>
          <p className="mt-1 text-lg">{est.exact ? 'Exact count' : `Not exact: ${est.count} ± ${u} pcs (95 %)`}</p>
        </div>
      ) : (
        <p className="num mt-2 text-[5rem] leading-none font-bold sm:text-[7rem]" data-testid="live-weight">
          {weight === null ? '—' : formatWeight(weight, division)}
          <span className="ml-3 text-3xl font-normal text-paper-line">g {showing === 'net' ? 'net' : ''}</span>
        </p>
      )}
      {targetQuantity != null && est ? (
        <div className="mt-4">
          <div className="flex justify-between text-sm">
            <span>Target {targetQuantity} pcs</span>
            <span className="num">{Math.round((est.count / targetQuantity) * 100)} %</span>
          </div>
          <div
            className="mt-1 h-4 rounded-full bg-ink-soft"
            role="progressbar"
            aria-valuemin={0}
            aria-valuemax={targetQuantity}
            aria-valuenow={est.count}
            aria-label="Progress to target"
          >
            <div className="h-4 rounded-full bg-brass" style={{ width: `${Math.min(100, (est.count / targetQuantity) * 100)}%` }} />
          </div>
          {verdict === 'out' && est.count < targetQuantity ? (
            <p data-testid="verdict" data-verdict="short" className="mt-3 inline-block rounded-md bg-ink-soft px-3 py-1.5 font-bold">
              {targetQuantity - est.count} to go
            </p>
          ) : verdict ? (
            <p data-testid="verdict" data-verdict={verdict} className={`mt-3 inline-block rounded-md px-3 py-1.5 font-bold ${VERDICT_TEXT[verdict].cls}`}>
              {VERDICT_TEXT[verdict].text}
            </p>
          ) : null}
        </div>
      ) : null}
    </section>
  );
}
