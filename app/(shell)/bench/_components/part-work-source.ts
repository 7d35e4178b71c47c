'use client';

import type { PartDto } from '@/lib/contracts/parts';
import { apiFetch } from '@/app/_components/api-client';
import type { WorkItem, WorkPurpose, WorkSource } from '../_lib/work-item';

function toItem(part: PartDto, purpose: WorkPurpose): WorkItem {
  return { purpose, key: `part-${part.id}`, partId: part.id, partNumber: part.partNumber, label: `${part.partNumber} — ${part.description}` };
}

// Parts from GET /api/v1/parts: a scanned code must match a part number exactly (stored upper-case).
export function partWorkSource(purpose: WorkPurpose): WorkSource {
  const search = async (q: string): Promise<PartDto[]> => {
    const res = await apiFetch<{ parts: PartDto[] }>(`/api/v1/parts?pageSize=12&q=${encodeURIComponent(q)}`);
    return res.ok ? res.data.parts.filter((p) => p.countingMethod === 'scale') : [];
  };
  return {
    id: 'parts',
    title: 'Parts',
    async search(query) {
      return (await search(query)).map((p) => toItem(p, purpose));
    },
    async resolveScan(code) {
      const wanted = code.trim().toUpperCase();
      const hit = (await search(wanted)).find((p) => p.partNumber === wanted);
      return hit ? toItem(hit, purpose) : null;
    },
  };
}
