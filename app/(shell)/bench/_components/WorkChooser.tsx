'use client';

import { useEffect, useEffectEvent, useMemo, useRef, useState } from 'react';
import { isTypingTarget } from '../_lib/shortcuts';
import { afterScan, createWedgeDetector } from '../_lib/wedge-scan';
import type { ToleranceBand, WorkItem, WorkPurpose } from '../_lib/work-item';
import { binWorkSource } from './bin-work-source';
import { partWorkSource } from './part-work-source';
import { queueWorkSource } from './queue-work-source';

const KINDS: Array<{ purpose: WorkPurpose; title: string; scanLabel: string; none: string }> = [
  {
    purpose: 'kit_line',
    title: 'Kitting queue — lines of released orders',
    scanLabel: 'Scan or type a part or order number',
    none: 'The kitting queue is empty.',
  },
  { purpose: 'part', title: 'Part count — sample stays on the pan', scanLabel: 'Scan or type a part number', none: 'No parts match.' },
  {
    purpose: 'bin',
    title: 'Bin count — bin weighed apart',
    scanLabel: 'Scan a bin label or type a part number',
    none: 'No bins match (bins due for counting are listed).',
  },
];

interface Props {
  onChoose(item: WorkItem): void;
  disabled?: boolean;
  /** A bin code to start with (from a link such as /bench?bin=K-01-1-01). */
  initialBin?: string | null;
  /** The site counts bins blind: their book quantity is not shown before the count. */
  blindCycleCounts: boolean;
}

const wholeOrNull = (text: string): number | null => (/^\d+$/.test(text.trim()) ? Number(text.trim()) : null);

// Scan a part number (a keyboard-wedge scanner types it and presses Enter) or pick from the list.
export function WorkChooser({ onChoose, disabled, initialBin, blindCycleCounts }: Props) {
  const [purpose, setPurpose] = useState<WorkPurpose>(initialBin ? 'bin' : 'part');
  const [query, setQuery] = useState(initialBin ?? '');
  const [items, setItems] = useState<WorkItem[]>([]);
  const [message, setMessage] = useState<string | null>(null);
  const [target, setTarget] = useState('');
  const [below, setBelow] = useState('0');
  const [above, setAbove] = useState('0');
  const source = useMemo(
    () => (purpose === 'kit_line' ? queueWorkSource() : purpose === 'bin' ? binWorkSource(blindCycleCounts) : partWorkSource(purpose)),
    [purpose, blindCycleCounts],
  );
  const kind = KINDS.find((k) => k.purpose === purpose)!;
  const scanRef = useRef<HTMLInputElement>(null);

  useEffect(() => {
    let live = true;
    const timer = setTimeout(() => void source.search(query).then((found) => live && setItems(found)), 150);
    return () => {
      live = false;
      clearTimeout(timer);
    };
  }, [query, source]);

  const choose = (item: WorkItem) => {
    setMessage(null);
    // A list fetched before the kind was switched is ignored: the item must be of the kind chosen now.
    if (item.purpose !== purpose) return;
    if (purpose !== 'part') return onChoose(item);
    const t = wholeOrNull(target);
    const tolerance: ToleranceBand | undefined = t != null ? { below: wholeOrNull(below) ?? 0, above: wholeOrNull(above) ?? 0 } : undefined;
    onChoose({ ...item, targetQuantity: t ?? undefined, tolerance });
  };

  const scan = async (text: string = query) => {
    if (!text.trim()) return;
    const hit = await source.resolveScan(text);
    if (hit) choose(hit);
    else setMessage(`Nothing to count matches ${text.trim().toUpperCase()} here.`);
  };
  const scanAs = useEffectEvent((code: string) => {
    setQuery(code);
    void scan(code);
  });

  // A scanner works wherever focus is: a fast burst ending in Enter is a scan, read into the scan
  // field in place of what it held. `/` puts the cursor there with its text selected.
  useEffect(() => {
    const wedge = createWedgeDetector();
    const onKey = (e: KeyboardEvent) => {
      if (e.key === '/' && !isTypingTarget(e.target)) {
        e.preventDefault();
        scanRef.current?.focus();
        scanRef.current?.select();
        return;
      }
      const code = wedge.key(e.key, e.timeStamp);
      if (!code) return;
      if (e.target === scanRef.current) {
        e.preventDefault();
        scanAs(afterScan(scanRef.current!.value, code));
      } else if (!isTypingTarget(e.target)) {
        e.preventDefault();
        scanAs(code);
      }
    };
    window.addEventListener('keydown', onKey, true);
    return () => window.removeEventListener('keydown', onKey, true);
  }, []);

  return (
    <section aria-labelledby="work-title" className="card space-y-4">
      <h2 id="work-title" className="text-lg font-bold">
        What are you counting?
      </h2>
      <fieldset className="grid grid-cols-3 gap-2" disabled={disabled}>
        <legend className="sr-only">Kind of count</legend>
        {KINDS.map((k) => (
          <label
            key={k.purpose}
            className={`flex min-h-14 cursor-pointer items-center justify-center gap-2 rounded-md border-2 px-3 text-center font-medium ${purpose === k.purpose ? 'border-forge bg-forge-light text-forge-dark' : 'border-paper-line bg-paper-card'}`}
          >
            <input
              type="radio"
              name="purpose"
              value={k.purpose}
              checked={purpose === k.purpose}
              onChange={() => {
                setItems([]);
                setPurpose(k.purpose);
              }}
              className="sr-only"
            />
            {k.title}
          </label>
        ))}
      </fieldset>
      {purpose === 'part' ? (
        <div className="grid grid-cols-3 gap-3">
          <div>
            <label htmlFor="work-target" className="field-label">
              Target pieces (optional)
            </label>
            <input id="work-target" inputMode="numeric" className="field num" value={target} onChange={(e) => setTarget(e.target.value)} disabled={disabled} />
          </div>
          <div>
            <label htmlFor="work-below" className="field-label">
              Allowed under
            </label>
            <input id="work-below" inputMode="numeric" className="field num" value={below} onChange={(e) => setBelow(e.target.value)} disabled={disabled} />
          </div>
          <div>
            <label htmlFor="work-above" className="field-label">
              Allowed over
            </label>
            <input id="work-above" inputMode="numeric" className="field num" value={above} onChange={(e) => setAbove(e.target.value)} disabled={disabled} />
          </div>
        </div>
      ) : null}
      <div>
        <label htmlFor="work-scan" className="field-label">
          {kind.scanLabel} <kbd className="num ml-1 rounded bg-paper-deep px-1.5 text-xs">/</kbd>
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
            // A scan's Enter was taken already (the window listener runs first and prevents it).
            if (e.key === 'Enter' && !e.defaultPrevented) {
              e.preventDefault();
              void scan();
            }
          }}
        />
        <p className="field-error" aria-live="polite">
          {message}
        </p>
      </div>
      <ul
        aria-label={`Matching ${source.title.toLowerCase()}`}
        className="max-h-72 divide-y divide-paper-line overflow-y-auto rounded-md border border-paper-line"
      >
        {items.map((item) => (
          <li key={item.key}>
            <button
              type="button"
              disabled={disabled}
              className="min-h-12 w-full px-3 py-2 text-left hover:bg-forge-light disabled:opacity-50"
              onClick={() => choose(item)}
            >
              {item.label}
            </button>
          </li>
        ))}
        {items.length === 0 ? <li className="px-3 py-3 text-sm text-ink-faint">{kind.none}</li> : null}
      </ul>
    </section>
  );
}
