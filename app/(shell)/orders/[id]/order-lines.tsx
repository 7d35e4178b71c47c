'use client';

import { useState } from 'react';
import { VERDICT_STYLE, VERDICT_WORDS } from '@/lib/order-words';
import type { OrderDto, OrderLineDto } from '@/lib/contracts/orders';
import { apiFetch } from '../../../_components/api-client';
import { ConfirmBar, type PendingConfirm } from '../../../_components/confirm-bar';

interface Props {
  lines: OrderLineDto[];
  /** Set when the viewer may send lines of this open order back for a recount. */
  recount?: { orderId: number; orderNumber: string; version: number; onChanged(o: OrderDto): void };
}

// The counted quantity is shown with its ± whole pieces (95 %), the captures' shared APW counted once.
export function OrderLines({ lines, recount }: Props) {
  const [pending, setPending] = useState<PendingConfirm | null>(null);
  const [message, setMessage] = useState<string | null>(null);
  const ask = (l: OrderLineDto) => {
    if (!recount) return;
    setPending({
      question: `Send ${l.partNumber} of ${recount.orderNumber} back for a recount? Its ${l.counted} counted pieces no longer count for the line (the captures stay on record); empty the bag and count the line again.`,
      yes: 'Yes, count it again',
      onConfirm: async () => {
        const res = await apiFetch<{ order: OrderDto }>(`/api/v1/orders/${recount.orderId}/lines/${l.id}/recount`, {
          method: 'POST',
          body: { version: recount.version },
        });
        if (res.ok) recount.onChanged(res.data.order);
        setMessage(res.ok ? `${l.partNumber} is back in the kitting queue.` : res.message);
      },
    });
  };
  return (
    <div className="space-y-2 overflow-x-auto">
      <ConfirmBar pending={pending} onDone={() => setPending(null)} />
      {message ? (
        <p role="status" className="text-sm" data-testid="recount-notice">
          {message}
        </p>
      ) : null}
      <table className="w-full text-sm md:text-base" data-testid="order-lines">
        <caption className="sr-only">Lines of the order</caption>
        <thead>
          <tr className="text-left border-b border-paper-line text-ink-soft">
            <th scope="col" className="py-2 pr-3">
              Part
            </th>
            <th scope="col" className="py-2 pr-3 text-right">
              Required <span className="block text-xs font-normal">allowed −/+</span>
            </th>
            <th scope="col" className="py-2 pr-3 text-right">
              Counted <span className="block text-xs font-normal">± U (95 %)</span>
            </th>
            <th scope="col" className="py-2">
              Verdict
            </th>
          </tr>
        </thead>
        <tbody>
          {lines.map((l) => (
            <tr key={l.id} className="border-b border-paper-line" data-testid={`line-${l.partNumber}`}>
              <td className="py-2 pr-3">
                <span className="num font-medium whitespace-nowrap">{l.partNumber}</span>
                <span className="block text-ink-faint text-sm">
                  {l.description} · {l.quantityPerKit} per kit
                </span>
              </td>
              <td className="py-2 pr-3 text-right num whitespace-nowrap">
                {l.required}
                <span className="block text-sm text-ink-faint">
                  −{l.toleranceBelow} / +{l.toleranceAbove}
                </span>
              </td>
              <td className="py-2 pr-3 text-right num whitespace-nowrap">
                {l.captures ? l.counted : '—'}
                <span className="block text-sm text-ink-faint">
                  {l.captures ? (l.wholePieceRange === 0 ? 'exact' : `± ${l.wholePieceRange}`) : 'not counted yet'}
                </span>
              </td>
              <td className="py-2">
                <span className={`inline-block rounded px-2 py-1 text-sm whitespace-nowrap ${VERDICT_STYLE[l.verdict]}`}>{VERDICT_WORDS[l.verdict]}</span>
                {recount && (l.verdict === 'uncertain' || l.verdict === 'out') ? (
                  <button type="button" className="btn-quiet ml-2 min-h-11" onClick={() => ask(l)}>
                    Count again…
                  </button>
                ) : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
