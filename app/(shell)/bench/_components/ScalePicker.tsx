'use client';

import type { ScaleDto } from '@/lib/contracts/scales';
import { ScaleFacts, ScaleStatus } from './ScaleStatus';

const KIND_TEXT: Record<ScaleDto['connection']['kind'], string> = {
  simulator: 'simulator',
  serial: 'serial port',
  raw_adc: 'load-cell front end',
  keyed: 'typed weights',
};

interface Props {
  scales: ScaleDto[];
  scaleId: number | null;
  /** free: no count yet; move: the count may go on to another scale with its sample; fixed: not now. */
  choice: 'free' | 'move' | 'fixed';
  /** The scale the sample was weighed on, when the count moved on from it. */
  sampleScaleId: number | null;
  onPick(id: number): void;
}

export function ScalePicker({ scales, scaleId, choice, sampleScaleId, onPick }: Props) {
  const scale = scales.find((s) => s.id === scaleId) ?? null;
  const sampleScale = scales.find((s) => s.id === sampleScaleId) ?? null;
  return (
    <section aria-labelledby="scale-title" className="card space-y-3">
      <h2 id="scale-title" className="font-bold">
        Scale
      </h2>
      <label htmlFor="scale-pick" className="sr-only">
        Scale
      </label>
      <select id="scale-pick" className="field" value={scaleId ?? ''} disabled={choice === 'fixed'} onChange={(e) => onPick(Number(e.target.value))}>
        {scales.map((s) => (
          <option key={s.id} value={s.id}>
            {s.name} — Max {s.capacity} g, d {s.division} g, class {s.accuracyClass} ({KIND_TEXT[s.connection.kind]}
            {s.status === 'locked' ? ', locked' : s.status === 'due' ? ', due' : ''})
          </option>
        ))}
      </select>
      {scale ? (
        <>
          <ScaleFacts scale={scale} />
          <ScaleStatus scale={scale} />
        </>
      ) : (
        <p className="text-ink-soft">No scales are set up yet. Ask an administrator to add one.</p>
      )}
      {sampleScale ? (
        <p className="text-sm" data-testid="sample-scale">
          Sample weighed on {sampleScale.name}; the count is read here.
        </p>
      ) : null}
      {choice === 'move' ? (
        <p className="text-sm text-ink-soft">
          Choosing another scale moves the count there and keeps the sample (for a bulk too heavy or too coarse for this one).
        </p>
      ) : null}
      {choice === 'fixed' ? (
        <p className="text-sm text-ink-soft">The scale can change once the sample is weighed; before that, stop the count to change it.</p>
      ) : null}
    </section>
  );
}
