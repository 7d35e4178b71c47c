'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import type { HeldSample } from '@/lib/contracts/parts';
import { apiFetch } from '../../_components/api-client';
import { ConfirmBar, type PendingConfirm } from '../../_components/confirm-bar';

const grams = (x: number) => `${Number(x.toPrecision(6))} g`;

// Samples far from their part's history wait here. Each decision is asked twice, with what it does.
export function HeldSamples({ samples }: { samples: HeldSample[] }) {
  const router = useRouter();
  const [asking, setAsking] = useState<{ id: number; confirm: PendingConfirm } | null>(null);
  const [message, setMessage] = useState<string | null>(null);
  if (samples.length === 0 && !message) return null;
  const ask = (s: HeldSample, decision: 'accept' | 'reject') =>
    setAsking({
      id: s.id,
      confirm:
        decision === 'accept'
          ? {
              question: `Accepting makes ${grams(s.averagePieceWeight)} the piece weight of ${s.partNumber}${s.partApw != null ? ` (now ${grams(s.partApw)})` : ''} and lets the sample teach its spread.`,
              yes: 'Yes, accept',
              tone: 'primary',
              onConfirm: () => decide(s, 'accept'),
            }
          : {
              question: `Rejecting keeps the sample on record but it teaches ${s.partNumber} nothing.`,
              yes: 'Yes, reject',
              onConfirm: () => decide(s, 'reject'),
            },
    });
  const decide = async (s: HeldSample, decision: 'accept' | 'reject') => {
    const res = await apiFetch(`/api/v1/parts/${s.partId}/samples/${s.id}/decision`, { method: 'POST', body: { decision } });
    setMessage(res.ok ? `${s.partNumber}: sample ${decision === 'accept' ? 'accepted' : 'rejected'}.` : res.message);
    if (res.ok) router.refresh();
  };
  return (
    <section aria-labelledby="held-title" className="card space-y-3" data-testid="held-samples">
      <h2 id="held-title" className="text-lg font-bold">
        Samples held for review
      </h2>
      <p className="text-sm text-ink-soft">
        These samples sit far from what their part has weighed before. Until someone accepts one, it changes neither the part’s piece weight nor its spread.
      </p>
      {message ? (
        <p role="status" className="text-sm">
          {message}
        </p>
      ) : null}
      <ul className="divide-y divide-paper-line">
        {samples.map((s) => (
          <li key={s.id} className="py-3" data-testid={`held-${s.id}`}>
            <p className="font-bold">
              {s.partNumber}{' '}
              <span className="font-normal text-ink-soft">
                · {s.quantity} pcs at {grams(s.averagePieceWeight)} each · {s.scaleName} · {s.takenBy}
              </span>
            </p>
            <p className="text-sm">{s.holdReason}.</p>
            {asking?.id === s.id ? (
              <div className="mt-2">
                <ConfirmBar pending={asking.confirm} onDone={() => setAsking(null)} />
              </div>
            ) : (
              <div className="mt-2 flex flex-wrap gap-2">
                <button type="button" className="btn-primary" onClick={() => ask(s, 'accept')}>
                  Accept…
                </button>
                <button type="button" className="btn-danger" onClick={() => ask(s, 'reject')}>
                  Reject…
                </button>
              </div>
            )}
          </li>
        ))}
      </ul>
    </section>
  );
}
