'use client';

import { parseBinCode } from '@/lib/bin-code';
import type { BinDto } from '@/lib/contracts/bins';
import { apiFetch } from '@/app/_components/api-client';
import type { WorkItem, WorkSource } from '../_lib/work-item';

// A cycle count of one bin, against the bin's version when it was picked: if someone else counts
// the same bin meanwhile, the server refuses this capture and the bin is counted again.
// Blind (the site's default), the counter does not see the book quantity: it would steer the count.
function toItem(bin: BinDto, blind: boolean): WorkItem {
  return {
    purpose: 'bin',
    key: `bin-${bin.id}`,
    partId: bin.partId,
    partNumber: bin.partNumber,
    label: blind ? `${bin.code} · ${bin.partNumber}` : `${bin.code} · ${bin.partNumber} — book ${bin.bookQuantity}`,
    binId: bin.id,
    binVersion: bin.version,
  };
}

// Bins from GET /api/v1/bins: a scanned bin label (Code 128 of the bin code) picks that bin;
// typing a part number lists the bins due for counting of that part.
export function binWorkSource(blind: boolean): WorkSource {
  return {
    id: 'bins',
    title: 'Bins',
    async search(query) {
      const q = query.trim().toUpperCase();
      if (parseBinCode(q)) {
        const res = await apiFetch<{ bins: BinDto[] }>(`/api/v1/bins?code=${encodeURIComponent(q)}`);
        return res.ok ? res.data.bins.map((b) => toItem(b, blind)) : [];
      }
      const res = await apiFetch<{ bins: BinDto[] }>('/api/v1/bins/due');
      return res.ok
        ? res.data.bins
            .filter((b) => !q || b.partNumber.includes(q) || b.code.startsWith(q))
            .slice(0, 30)
            .map((b) => toItem(b, blind))
        : [];
    },
    async resolveScan(code) {
      if (!parseBinCode(code)) return null;
      const res = await apiFetch<{ bins: BinDto[] }>(`/api/v1/bins?code=${encodeURIComponent(code.trim())}`);
      return res.ok && res.data.bins.length === 1 ? toItem(res.data.bins[0], blind) : null;
    },
  };
}
