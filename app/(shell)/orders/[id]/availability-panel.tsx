'use client';

import { useState } from 'react';
import type { AvailabilityLine } from '@/lib/contracts/orders';
import { apiFetch } from '../../../_components/api-client';

// Before release: what each line needs against what is on hand and not held by other orders.
export function AvailabilityPanel({ orderId, initial }: { orderId: number; initial: AvailabilityLine[] }) {
  const [lines, setLines] = useState(initial);
  const [message, setMessage] = useState<string | null>(null);
  const short = lines.filter((l) => l.shortage > 0);

  async function recheck() {
    const res = await apiFetch<{ lines: AvailabilityLine[] }>(`/api/v1/orders/${orderId}/availability`);
    if (res.ok) {
      setLines(res.data.lines);
      setMessage('Checked just now.');
    } else setMessage(res.message);
  }

  return (
    <section className="card space-y-3" aria-labelledby="availability-title">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="availability-title" className="font-bold">
          Stock for this order
        </h2>
        <button type="button" className="btn-quiet" onClick={recheck}>
          Check again
        </button>
      </div>
      <p role="status" aria-live="polite" className={short.length ? 'text-fault font-medium' : 'text-ok font-medium'} data-testid="availability-summary">
        {short.length
          ? `${short.length} part${short.length === 1 ? ' is' : 's are'} short; the order cannot be released yet.`
          : 'Every part is in stock; releasing will hold it for this order.'}
        {message ? <span className="ml-2 font-normal text-ink-faint">{message}</span> : null}
      </p>
      <div className="overflow-x-auto">
        <table className="w-full text-sm">
          <caption className="sr-only">Required against available stock</caption>
          <thead>
            <tr className="text-left border-b border-paper-line text-ink-soft">
              <th scope="col" className="py-2 pr-3">
                Part
              </th>
              <th scope="col" className="py-2 pr-3 text-right">
                Required
              </th>
              <th scope="col" className="py-2 pr-3 text-right">
                On hand
              </th>
              <th scope="col" className="py-2 pr-3 text-right">
                Held by other orders
              </th>
              <th scope="col" className="py-2 pr-3 text-right">
                Available
              </th>
              <th scope="col" className="py-2">
                Shortage
              </th>
            </tr>
          </thead>
          <tbody>
            {lines.map((l) => (
              <tr key={l.partId} className={`border-b border-paper-line ${l.shortage ? 'bg-fault-light/60' : ''}`}>
                <td className="py-2 pr-3 num">{l.partNumber}</td>
                <td className="py-2 pr-3 text-right num">{l.required}</td>
                <td className="py-2 pr-3 text-right num">{l.onHand}</td>
                <td className="py-2 pr-3 text-right num">{l.reserved}</td>
                <td className="py-2 pr-3 text-right num">{l.available}</td>
                <td className="py-2">
                  {l.shortage ? <span className="text-fault font-medium">Short by {l.shortage}</span> : <span className="text-ok">enough</span>}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
