import type { CountEventDto } from '@/server/schemas/counts';
import { formatGrams } from '../../../_components/format';

// What the server recorded, computed by the server from the weights sent.
export function CaptureResult({ count }: { count: CountEventDto }) {
  const u = count.wholePieceRange;
  return (
    <section aria-labelledby="result-title" className="card border-2 border-ok" data-testid="capture-result" data-count={count.count} data-exact={String(count.exact)} data-id={count.id}>
      <h2 id="result-title" className="font-bold text-ok">Recorded by the server</h2>
      <p className="num mt-1 text-5xl font-bold">
        {count.count}
        {!count.exact ? <span className="text-brass"> ± {u}</span> : null} pcs
      </p>
      <p className="num mt-1 text-sm text-ink-soft">
        net {formatGrams(count.net)} · sample {count.sampleQuantity} pcs, {formatGrams(count.sampleNetWeight)} · APW {formatGrams(count.averagePieceWeight)} · {count.exact ? 'exact' : `± ${u} pcs (95 %)`}
      </p>
      {count.warnings.length ? <p className="mt-1 text-sm text-caution">Noted with the count: {count.warnings.map((w) => w.message).join(' ')}</p> : null}
    </section>
  );
}
