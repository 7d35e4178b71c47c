'use client';

import { useEffect, useMemo, useRef, useState } from 'react';
import type { ToleranceBand, WorkItem, WorkPurpose } from '../_lib/work-item';
import { partWorkSource } from './part-work-source';

interface Props {
  onChoose(item: WorkItem): void;
  disabled?: boolean;
}

const wholeOrNull = (text: string): number | null => (/^\d+$/.test(text.trim()) ? Number(text.trim()) : null);

// Scan a part number (a keyboard-wedge scanner types it and presses Enter) or pick from the list.
export function WorkChooser({ onChoose, disabled }: Props) {
  const [purpose, setPurpose] = useState<WorkPurpose>('part');
  const [query, setQuery] = useState('');
  const [items, setItems] = useState<WorkItem[]>([]);
  const [message, setMessage] = useState<string | null>(null);
  const [target, setTarget] = useState('');
  const [below, setBelow] = useState('0');
  const [above, setAbove] = useState('0');
  const source = useMemo(() => partWorkSource(purpose), [purpose]);
  const scanRef = useRef<HTMLInputElement>(null);

  useEffect(() => {
    let live = true;
    const timer = setTimeout(() => void source.search(query).then((found) => live && setItems(found)), 150);
    return () => {
      live = false;
      clearTimeout(timer);
    };
  }, [query, source]);

  useEffect(() => {
    const focusScan = (e: KeyboardEvent) => {
      if (e.key === '/' && document.activeElement?.tagName !== 'INPUT') {
        e.preventDefault();
        scanRef.current?.focus();
      }
    };
    window.addEventListener('keydown', focusScan);
    return () => window.removeEventListener('keydown', focusScan);
  }, []);

  const choose = (item: WorkItem) => {
    const t = purpose === 'part' ? wholeOrNull(target) : null;
    const tolerance: ToleranceBand | undefined = t != null ? { below: wholeOrNull(below) ?? 0, above: wholeOrNull(above) ?? 0 } : undefined;
    setMessage(null);
    // The kind chosen now wins over a list item fetched before the switch.
    onChoose({ ...item, purpose, targetQuantity: t ?? undefined, tolerance });
  };

  const scan = async () => {
    if (!query.trim()) return;
    const hit = await source.resolveScan(query);
    if (hit) choose(hit);
    else setMessage(`No part numbered ${query.trim().toUpperCase()} is counted by weight.`);
  };

  return (
    <section aria-labelledby="work-title" className="card space-y-4">
      <h2 id="work-title" className="text-lg font-bold">What are you counting?</h2>
      <fieldset className="grid grid-cols-2 gap-2" disabled={disabled}>
        <legend className="sr-only">Kind of count</legend>
        {(['part', 'bin'] as const).map((p) => (
          <label key={p} className={`flex min-h-14 cursor-pointer items-center justify-center gap-2 rounded-md border-2 px-3 text-center font-medium ${purpose === p ? 'border-forge bg-forge-light text-forge-dark' : 'border-paper-line bg-paper-card'}`}>
            <input type="radio" name="purpose" value={p} checked={purpose === p} onChange={() => setPurpose(p)} className="sr-only" />
            {p === 'part' ? 'Part count — sample stays on the pan' : 'Bin count — bin weighed apart'}
          </label>
        ))}
      </fieldset>
      {purpose === 'part' ? (
        <div className="grid grid-cols-3 gap-3">
          <div>
            <label htmlFor="work-target" className="field-label">Target pieces (optional)</label>
            <input id="work-target" inputMode="numeric" className="field num" value={target} onChange={(e) => setTarget(e.target.value)} disabled={disabled} />
          </div>
          <div>
            <label htmlFor="work-below" className="field-label">Allowed under</label>
            <input id="work-below" inputMode="numeric" className="field num" value={below} onChange={(e) => setBelow(e.target.value)} disabled={disabled} />
          </div>
          <div>
            <label htmlFor="work-above" className="field-label">Allowed over</label>
            <input id="work-above" inputMode="numeric" className="field num" value={above} onChange={(e) => setAbove(e.target.value)} disabled={disabled} />
          </div>
        </div>
      ) : null}
      <div>
        <label htmlFor="work-scan" className="field-label">
          Scan or type a part number <kbd className="num ml-1 rounded bg-paper-deep px-1.5 text-xs">/</kbd>
        </label>
        <input
          id="work-scan"
          ref={scanRef}
          className="field num text-lg"
          autoComplete="off"
          value={query}
          disabled={disabled}
          onChange={(e) => setQuery(e.target.value)}
          onKeyDown={(e) => {
            if (e.key === 'Enter') {
              e.preventDefault();
              void scan();
            }
          }}
        />
        <p className="field-error" aria-live="polite">{message}</p>
      </div>
      <ul aria-label="Matching parts" className="max-h-72 divide-y divide-paper-line overflow-y-auto rounded-md border border-paper-line">
        {items.map((item) => (
          <li key={item.partId}>
            <button type="button" disabled={disabled} className="min-h-12 w-full px-3 py-2 text-left hover:bg-forge-light disabled:opacity-50" onClick={() => choose(item)}>
              {item.label}
            </button>
          </li>
        ))}
        {items.length === 0 ? <li className="px-3 py-3 text-sm text-ink-faint">No parts match.</li> : null}
      </ul>
    </section>
  );
}
