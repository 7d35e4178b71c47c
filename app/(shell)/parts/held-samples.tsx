'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import type { HeldSample } from '@/server/services/parts/held-samples';
import { apiFetch } from '../../_components/api-client';

const grams = (x: number) => `${Number(x.toPrecision(6))} g`;

// Samples far from their part's history wait here. Each decision is asked twice, with what it does.
export function HeldSamples({ samples }: { samples: HeldSample[] }) {
  const router = useRouter();
  const [asking, setAsking] = useState<{ id: number; decision: 'accept' | 'reject' } | null>(null);
  const [message, setMessage] = useState<string | null>(null);
  if (samples.length === 0 && !message) return null;
  const decide = async (s: HeldSample, decision: 'accept' | 'reject') => {
    const res = await apiFetch(`/api/v1/parts/${s.partId}/samples/${s.id}/decision`, { method: 'POST', body: { decision } });
    setAsking(null);
    setMessage(res.ok ? `${s.partNumber}: sample ${decision === 'accept' ? 'accepted' : 'rejected'}.` : res.message);
    if (res.ok) router.refresh();
  };
  return (
    <section aria-labelledby="held-title" className="card space-y-3" data-testid="held-samples">
      <h2 id="held-title" className="text-lg font-bold">Samples held for review</h2>
      <p className="text-sm text-ink-soft">These samples sit far from what their part has weighed before. Until someone accepts one, it changes neither the part’s piece weight nor its spread.</p>
      {message ? <p role="status" className="text-sm">{message}</p> : null}
      <ul className="divide-y divide-paper-line">
        {samples.map((s) => (
          <li key={s.id} className="py-3" data-testid={`held-${s.id}`}>
            <p className="font-bold">{s.partNumber} <span className="font-normal text-ink-soft">· {s.quantity} pcs at {grams(s.averagePieceWeight)} each · {s.scaleName} · {s.takenBy}</span></p>
            <p className="text-sm">{s.holdReason}.</p>
            {asking?.id === s.id ? (
              <div className="mt-2 flex flex-wrap items-center gap-2">
                <span className="text-sm">
                  {asking.decision === 'accept'
                    ? `Accepting makes ${grams(s.averagePieceWeight)} the piece weight of ${s.partNumber}${s.partApw != null ? ` (now ${grams(s.partApw)})` : ''} and lets the sample teach its spread.`
                    : `Rejecting keeps the sample on record but it teaches ${s.partNumber} nothing.`}
                </span>
                <button type="button" className={asking.decision === 'accept' ? 'btn-primary' : 'btn-danger'} onClick={() => void decide(s, asking.decision)}>
                  {asking.decision === 'accept' ? 'Yes, accept' : 'Yes, reject'}
                </button>
                <button type="button" className="btn-quiet" onClick={() => setAsking(null)}>Keep it waiting</button>
              </div>
            ) : (
              <div className="mt-2 flex flex-wrap gap-2">
                <button type="button" className="btn-primary" onClick={() => setAsking({ id: s.id, decision: 'accept' })}>Accept…</button>
                <button type="button" className="btn-danger" onClick={() => setAsking({ id: s.id, decision: 'reject' })}>Reject…</button>
              </div>
            )}
          </li>
        ))}
      </ul>
    </section>
  );
}
