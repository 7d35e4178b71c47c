import { useSiteTime } from '../../../_components/site-time';
import type { QueuedCapture } from '../_lib/capture-queue';

export function QueuePanel({ items, onSend, onDrop }: { items: QueuedCapture[]; onSend(): void; onDrop(key: string): void }) {
  const { clock } = useSiteTime();
  if (items.length === 0) return null;
  return (
    <section aria-labelledby="queue-title" className="card space-y-2 border-caution" data-testid="capture-queue">
      <h2 id="queue-title" className="font-bold">
        Waiting to be sent ({items.length})
      </h2>
      <p className="text-sm text-ink-soft">
        Saved on this tablet while the server could not be reached. They are sent, once each, when the connection is back.
      </p>
      <ul className="divide-y divide-paper-line text-sm">
        {items.map((q) => (
          <li key={q.key} data-key={q.key} className="flex items-center justify-between gap-2 py-2">
            <span>
              {q.label} · <span className="num">{clock(q.queuedAt)}</span>
              {q.error ? <span className="block text-fault">Refused: {q.error}</span> : null}
            </span>
            {q.error ? (
              <button type="button" className="btn-quiet" onClick={() => onDrop(q.key)}>
                Remove
              </button>
            ) : null}
          </li>
        ))}
      </ul>
      <button type="button" className="btn-quiet min-h-12" onClick={onSend}>
        Send now
      </button>
    </section>
  );
}
