'use client';

import { useEffect, useEffectEvent, useRef, useState } from 'react';
import { createSimulatorSource } from '@/lib/scale/simulator-source';
import type { SimulatedScale } from '@/lib/scale/simulator';
import type { ReadingSource } from '@/lib/scale/reading';
import type { ScaleDto } from '@/lib/contracts/scales';
import { applyPanAction, buildSimulatedScale, containerOnPan, DEMO_PIECE_WEIGHT_G, piecesOnPan, type PanAction, type PracticePan } from '../_lib/practice-pan';
import { browserStore } from './browser-store';
import { WarningRecipes } from './WarningRecipes';

interface Props {
  scale: ScaleDto;
  part: { id: number; averagePieceWeight: number | null; pieceSpread: number | null } | null;
  containerWeight: number;
  onSource(source: ReadingSource | null): void;
}

type SavedPan = PracticePan & { partId: number | null };
const panKey = (scaleId: number) => `tallyforge.bench.pan.${scaleId}`;

/** Tests and demos pin the simulator with ?seed=N; otherwise each new pan gets its own seed. */
function seedFromUrl(): number | null {
  const s = new URLSearchParams(window.location.search).get('seed');
  return s && /^\d+$/.test(s) ? Number(s) >>> 0 : null;
}

function readPan(scaleId: number): SavedPan | null {
  try {
    const p = JSON.parse(browserStore.getItem(panKey(scaleId)) ?? 'null') as SavedPan | null;
    return p && typeof p.seed === 'number' && Array.isArray(p.actions) ? p : null;
  } catch {
    return null;
  }
}

// Practice pieces of an unlearned part scatter like typical stamped parts (2 %; common practice).
const PRACTICE_PIECE_SPREAD = 0.02;

function freshPan(part: Props['part'], seed: number): SavedPan {
  return {
    seed,
    partId: part?.id ?? null,
    pieceWeight: part?.averagePieceWeight ?? DEMO_PIECE_WEIGHT_G,
    spread: part?.pieceSpread ?? PRACTICE_PIECE_SPREAD,
    actions: [],
  };
}

// The simulator's practice pan: a scale in the browser with the chosen scale's capacity, division
// and repeatability, and controls to put pieces and the container on and off.
export function PracticePanel({ scale, part, containerWeight, onSource }: Props) {
  const [pan, setPan] = useState<SavedPan | null>(null);
  const [n, setN] = useState('10');
  const [weightText, setWeightText] = useState('');
  const [generation, setGeneration] = useState(0);
  const simRef = useRef<SimulatedScale | null>(null);
  const conn = scale.connection.kind === 'simulator' ? scale.connection : { settleMs: 250, driftPerMinute: 0, rateHz: 20 };

  // The pan belongs to the scale; a different part on it starts an empty pan with that part.
  const placePan = useEffectEvent((scaleId: number) => {
    const urlSeed = seedFromUrl();
    const saved = readPan(scaleId);
    const samePart = saved && (part === null || saved.partId === part.id);
    const seedOk = saved && (urlSeed === null || saved.seed === urlSeed);
    setPan(saved && samePart && seedOk ? saved : freshPan(part, urlSeed ?? Date.now() >>> 0));
  });
  const partId = part?.id;
  useEffect(() => placePan(scale.id), [scale.id, partId]);

  useEffect(() => {
    if (pan) browserStore.setItem(panKey(scale.id), JSON.stringify(pan));
  }, [pan, scale.id]);

  // The simulator is built again when the pan's pieces change, not on every change of the pan's load.
  const startSimulator = useEffectEvent(() => {
    if (!pan) return;
    const sim = buildSimulatedScale(
      {
        capacity: scale.capacity,
        division: scale.division,
        repeatability: scale.repeatability ?? 0,
        settleMs: conn.settleMs,
        driftPerMinute: conn.driftPerMinute,
        rateHz: conn.rateHz,
      },
      pan,
    );
    simRef.current = sim;
    const source = createSimulatorSource(sim);
    void source.start();
    onSource(source);
    return () => {
      void source.stop();
      onSource(null);
    };
  });
  useEffect(() => startSimulator(), [pan?.seed, pan?.pieceWeight, pan?.spread, pan?.partId, generation, scale.id]);

  const act = (action: PanAction) => {
    if (!simRef.current || !pan) return;
    applyPanAction(simRef.current, action);
    setPan({ ...pan, actions: [...pan.actions, action] });
  };
  const count = Math.max(1, Math.min(100_000, Number.parseInt(n, 10) || 1));
  const onPan = pan ? piecesOnPan(pan) : 0;
  const container = pan ? containerOnPan(pan) : null;

  return (
    <section aria-labelledby="practice-title" className="card space-y-3 border-2 border-dashed border-brass">
      <div className="flex items-baseline justify-between gap-2">
        <h2 id="practice-title" className="font-bold">
          Practice pan <span className="rounded bg-brass-light px-2 py-0.5 text-sm text-brass-dark">simulator — not a real scale</span>
        </h2>
      </div>
      <p className="text-sm text-ink-soft" data-testid="pan-contents">
        On the pan: <span className="num font-bold">{onPan}</span> pieces
        {container !== null ? (
          <>
            {' '}
            and a container of <span className="num">{container} g</span>
          </>
        ) : null}
        . One piece weighs about <span className="num">{pan?.pieceWeight ?? '–'} g</span>.
      </p>
      <div className="flex flex-wrap items-end gap-2">
        <div className="w-24">
          <label htmlFor="pan-n" className="field-label">
            Pieces
          </label>
          <input id="pan-n" className="field num" inputMode="numeric" value={n} onChange={(e) => setN(e.target.value)} />
        </div>
        <button type="button" className="btn-quiet min-h-12" onClick={() => act({ kind: 'add', n: count })}>
          Put on {count}
        </button>
        <button type="button" className="btn-quiet min-h-12" onClick={() => act({ kind: 'remove', n: count })}>
          Take off {count}
        </button>
        <button type="button" className="btn-quiet min-h-12" onClick={() => act({ kind: 'add', n: 1 })}>
          Put on 1
        </button>
      </div>
      <div className="flex flex-wrap gap-2">
        {container === null ? (
          <button type="button" className="btn-quiet min-h-12" onClick={() => act({ kind: 'container', weight: containerWeight })}>
            Place container ({containerWeight} g)
          </button>
        ) : (
          <button type="button" className="btn-quiet min-h-12" onClick={() => act({ kind: 'container-off' })}>
            Lift container off
          </button>
        )}
        <button type="button" className="btn-quiet min-h-12" onClick={() => act({ kind: 'clear' })}>
          Empty the pan
        </button>
      </div>
      <form
        className="flex flex-wrap items-end gap-2"
        onSubmit={(e) => {
          e.preventDefault();
          const w = Number(weightText.replace(',', '.'));
          if (pan && Number.isFinite(w) && w > 0) {
            setPan({ ...pan, pieceWeight: w, actions: [] });
            setGeneration((g) => g + 1);
          }
        }}
      >
        <div className="w-36">
          <label htmlFor="pan-weight" className="field-label">
            Practice piece weight, g
          </label>
          <input
            id="pan-weight"
            className="field num"
            inputMode="decimal"
            value={weightText}
            placeholder={String(pan?.pieceWeight ?? '')}
            onChange={(e) => setWeightText(e.target.value)}
          />
        </div>
        <button type="submit" className="btn-quiet min-h-12">
          Use (empties the pan)
        </button>
      </form>
      <WarningRecipes />
    </section>
  );
}
