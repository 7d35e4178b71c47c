import type { CountEventDto } from '@/lib/contracts/counts';
import { formatGrams } from '../../../_components/format';
import { describeBinOutcome } from '../_lib/bin-outcome';
import type { CaptureAnswer } from './use-bench';

// What the server recorded, computed by the server from the weights sent, and for a bin what became of it.
export function CaptureResult({ answer }: { answer: CaptureAnswer }) {
  const count: CountEventDto = answer.count;
  const u = count.wholePieceRange;
  const outcome = answer.binCount ? describeBinOutcome({ ...answer.binCount, wholePieceRange: u }) : null;
  return (
    <section
      aria-labelledby="result-title"
      className="card border-2 border-ok"
      data-testid="capture-result"
      data-count={count.count}
      data-exact={String(count.exact)}
      data-id={count.id}
    >
      <h2 id="result-title" className="font-bold text-ok">
        Recorded by the server
      </h2>
      <p className="num mt-1 text-5xl font-bold">
        {count.count}
        {!count.exact ? <span className="text-brass"> ± {u}</span> : null} pcs
      </p>
      <p className="num mt-1 text-sm text-ink-soft">
        net {formatGrams(count.net)} · sample {count.sampleQuantity} pcs, {formatGrams(count.sampleNetWeight)} · APW {formatGrams(count.averagePieceWeight)} ·{' '}
        {count.exact ? 'exact' : `± ${u} pcs (95 %)`}
      </p>
      {outcome ? (
        <p
          data-testid="bin-outcome"
          className={`mt-2 rounded-md px-3 py-2 ${outcome.tone === 'caution' ? 'bg-caution-light text-ink' : 'bg-ok-light text-ok'}`}
        >
          {outcome.text}
        </p>
      ) : null}
      {count.warnings.length ? <p className="mt-1 text-sm text-caution">Noted with the count: {count.warnings.map((w) => w.message).join(' ')}</p> : null}
    </section>
  );
}
