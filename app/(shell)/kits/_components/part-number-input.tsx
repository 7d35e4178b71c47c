'use client';

import { useEffect, useEffectEvent, useId, useState } from 'react';
import type { PartDto } from '@/lib/contracts/parts';
import { apiFetch } from '../../../_components/api-client';

interface Props {
  id: string;
  value: string;
  onChange: (partNumber: string, part: PartDto | null) => void;
  invalid?: boolean;
  describedBy?: string;
}

// Typing a part number searches the parts list; an exact match picks that part.
export function PartNumberInput({ id, value, onChange, invalid, describedBy }: Props) {
  const listId = useId();
  const [suggestions, setSuggestions] = useState<PartDto[]>([]);
  // The parent passes a new onChange on every render; the search must run on typing only.
  const picked = useEffectEvent((partNumber: string, part: PartDto) => onChange(partNumber, part));
  useEffect(() => {
    const q = value.trim();
    if (q.length < 2) return;
    const timer = setTimeout(async () => {
      const res = await apiFetch<{ parts: PartDto[] }>(`/api/v1/parts?q=${encodeURIComponent(q)}&pageSize=20`);
      if (!res.ok) return;
      setSuggestions(res.data.parts);
      const exact = res.data.parts.find((p) => p.partNumber === q.toUpperCase());
      if (exact) picked(value, exact);
    }, 250);
    return () => clearTimeout(timer);
  }, [value]);
  return (
    <>
      <input
        id={id}
        className="field num"
        value={value}
        list={listId}
        autoComplete="off"
        aria-invalid={invalid || undefined}
        aria-describedby={describedBy}
        onChange={(e) => onChange(e.target.value, suggestions.find((p) => p.partNumber === e.target.value.trim().toUpperCase()) ?? null)}
      />
      <datalist id={listId}>
        {suggestions.map((p) => (
          <option key={p.id} value={p.partNumber}>
            {p.description}
          </option>
        ))}
      </datalist>
    </>
  );
}
