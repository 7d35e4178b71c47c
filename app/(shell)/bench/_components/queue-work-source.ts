'use client';

import type { QueueLine } from '@/lib/contracts/orders';
import { apiFetch } from '@/app/_components/api-client';
import type { WorkItem, WorkSource } from '../_lib/work-item';

// A build-order line still to count: the target is what the line still needs.
function toItem(line: QueueLine): WorkItem {
  return {
    purpose: 'kit_line',
    key: `line-${line.orderLineId}`,
    partId: line.partId,
    partNumber: line.partNumber,
    label: `${line.orderNumber} · ${line.partNumber} — ${line.remaining} of ${line.required} to count (${line.kitCode} rev ${line.kitRevision})`,
    orderLineId: line.orderLineId,
    targetQuantity: line.remaining,
    tolerance: { below: line.toleranceBelow, above: line.toleranceAbove },
  };
}

// The kitting queue from GET /api/v1/kitting-queue. A scanned part number picks that part's most
// urgent line; a scanned order number its first open line.
export function queueWorkSource(): WorkSource {
  const load = async (): Promise<QueueLine[]> => {
    const res = await apiFetch<{ lines: QueueLine[] }>('/api/v1/kitting-queue');
    return res.ok ? res.data.lines : [];
  };
  return {
    id: 'queue',
    title: 'Kitting queue',
    async search(query) {
      const q = query.trim().toUpperCase();
      const lines = await load();
      return lines
        .filter((l) => !q || l.partNumber.includes(q) || l.orderNumber.includes(q))
        .slice(0, 30)
        .map(toItem);
    },
    async resolveScan(code) {
      const wanted = code.trim().toUpperCase();
      const hit = (await load()).find((l) => l.partNumber === wanted || l.orderNumber === wanted);
      return hit ? toItem(hit) : null;
    },
  };
}
