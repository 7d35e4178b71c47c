'use client';

import type { ScaleDto } from '@/server/schemas/scales';
import { ScaleFacts, ScaleStatus } from './ScaleStatus';

const KIND_TEXT: Record<ScaleDto['connection']['kind'], string> = {
  simulator: 'simulator',
  serial: 'serial port',
  raw_adc: 'load-cell front end',
  keyed: 'typed weights',
};

export function ScalePicker({ scales, scaleId, locked, onPick }: { scales: ScaleDto[]; scaleId: number | null; locked: boolean; onPick(id: number): void }) {
  const scale = scales.find((s) => s.id === scaleId) ?? null;
  return (
    <section aria-labelledby="scale-title" className="card space-y-3">
      <h2 id="scale-title" className="font-bold">Scale</h2>
      <label htmlFor="scale-pick" className="sr-only">Scale</label>
      <select id="scale-pick" className="field" value={scaleId ?? ''} disabled={locked} onChange={(e) => onPick(Number(e.target.value))}>
        {scales.map((s) => (
          <option key={s.id} value={s.id}>
            {s.name} — Max {s.capacity} g, d {s.division} g, class {s.accuracyClass} ({KIND_TEXT[s.connection.kind]}{s.status === 'locked' ? ', locked' : s.status === 'due' ? ', due' : ''})
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
      {locked ? <p className="text-xs text-ink-faint">The scale stays fixed during a count; finish or restart it to change.</p> : null}
    </section>
  );
}
