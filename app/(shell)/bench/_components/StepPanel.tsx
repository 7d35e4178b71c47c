'use client';

import type { ContainerDto } from '@/lib/contracts/containers';
import type { GrowPlan } from '@/lib/weighing/grow-sample';
import { allows, type BenchAction } from '../_lib/bench-machine';
import type { BenchWork, KeptSample } from '../_lib/bench-work';
import { useSiteTime } from '../../../_components/site-time';
import { SHORTCUTS } from '../_lib/shortcuts';
import { KeyButton } from './KeyButton';

export interface StepActions {
  tare(): void;
  presetTare(): void;
  sample(): void;
  piece(): void;
  finishPieces(): void;
  grow(): void;
  count(): void;
  capture(): void;
  next(): void;
}

interface Props {
  work: BenchWork;
  actions: StepActions;
  containers: ContainerDto[];
  containerChoice: number | null;
  onContainerChoice(id: number | null): void;
  sampleQty: number;
  onSampleQty(n: number): void;
  growPlan: GrowPlan | null;
  busy: boolean;
  captureBlocked: string | null;
  /** A sample of this part kept when an earlier count was stopped. */
  kept: KeptSample | null;
  onUseKept(): void;
}

const STEP_NAMES: Array<[BenchWork['step'], string]> = [
  ['tare', 'Container'],
  ['sample', 'Sample'],
  ['grow', 'Grow'],
  ['count', 'Count'],
  ['captured', 'Done'],
];

function ContainerSelect({
  containers,
  value,
  onChange,
  label,
}: {
  containers: ContainerDto[];
  value: number | null;
  onChange(id: number | null): void;
  label: string;
}) {
  return (
    <div>
      <label htmlFor="container-pick" className="field-label">
        {label}
      </label>
      <select id="container-pick" className="field" value={value ?? ''} onChange={(e) => onChange(e.target.value ? Number(e.target.value) : null)}>
        <option value="">No container</option>
        {containers.map((c) => (
          <option key={c.id} value={c.id}>
            {c.name} — tare {c.tare} g
          </option>
        ))}
      </select>
    </div>
  );
}

// One step at a time, with the next action as the big button and its key shown on it.
export function StepPanel(p: Props) {
  const { work, actions } = p;
  const { clock } = useSiteTime();
  // The buttons read the same list as the keys: what the machine allows at this step.
  const off = (action: BenchAction, busy = false): boolean => !allows(work, action) || busy;
  const bin = work.purpose === 'bin';
  const pieceByPiece = work.pieceReadings.length > 1;
  const steps = STEP_NAMES.filter(([s]) => !(bin && s === 'grow'));
  const current = steps.findIndex(([s]) => s === work.step);
  return (
    <section aria-labelledby="step-title" className="card space-y-4">
      <ol className="flex flex-wrap gap-2 text-sm" aria-label="Steps">
        {steps.map(([s, name], i) => (
          <li
            key={s}
            aria-current={s === work.step ? 'step' : undefined}
            className={`rounded-full px-3 py-1 ${s === work.step ? 'bg-forge text-white' : i < current ? 'bg-ok-light text-ok' : 'bg-paper-deep text-ink-faint'}`}
          >
            {i + 1}. {name}
          </li>
        ))}
      </ol>
      {work.step === 'tare' ? (
        <div className="space-y-3">
          <h2 id="step-title" className="text-xl font-bold">
            {bin ? 'Empty the pan and zero it' : 'Put the empty container on the pan'}
          </h2>
          {work.bulkScaleId !== null && work.sample ? (
            <p className="text-lg" data-testid="moved-note">
              On this scale now: tare it as above, then put the sample of {work.sample.quantity} pieces and the rest on. The sample’s piece weight is kept.
            </p>
          ) : null}
          {!bin ? (
            <ContainerSelect containers={p.containers} value={p.containerChoice} onChange={p.onContainerChoice} label="Container (for its preset tare)" />
          ) : null}
          <div className="flex flex-wrap gap-2">
            <KeyButton shortcut={SHORTCUTS.tare} onClick={actions.tare} disabled={off('tare', p.busy)}>
              {bin ? 'Zero the empty pan' : 'Tare now'}
            </KeyButton>
            {!bin ? (
              <KeyButton tone="quiet" shortcut={SHORTCUTS.presetTare} onClick={actions.presetTare} disabled={off('presetTare', p.containerChoice === null)}>
                Use preset tare
              </KeyButton>
            ) : null}
          </div>
          {p.kept ? (
            <div className="flex flex-wrap items-center gap-3 rounded-md bg-brass-light px-4 py-3" data-testid="kept-sample">
              <p className="min-w-64 flex-1">
                A sample of {p.kept.sample.quantity} pieces of this part was kept at {clock(p.kept.keptAt)}. Start from it instead of weighing a new one (its
                pieces stay off the pan).
              </p>
              <button type="button" className="btn-quiet" onClick={p.onUseKept}>
                Use the kept sample
              </button>
            </div>
          ) : null}
          {work.sampleApart && work.sample ? (
            <p data-testid="kept-in-use">Counting from the kept sample of {work.sample.quantity} pieces: tare, then put on only the pieces to count.</p>
          ) : null}
        </div>
      ) : null}
      {work.step === 'sample' ? (
        <div className="space-y-3">
          <h2 id="step-title" className="text-xl font-bold">
            {pieceByPiece ? `Building the sample: ${work.pieceReadings.length - 1} pieces so far` : `Count ${p.sampleQty} pieces onto the pan`}
          </h2>
          {!pieceByPiece ? (
            <div className="w-40">
              <label htmlFor="sample-qty" className="field-label">
                Pieces in the sample
              </label>
              <input
                id="sample-qty"
                className="field num text-lg"
                inputMode="numeric"
                value={p.sampleQty}
                onChange={(e) => p.onSampleQty(Math.max(1, Number.parseInt(e.target.value, 10) || 1))}
              />
            </div>
          ) : null}
          <div className="flex flex-wrap gap-2">
            {!pieceByPiece ? (
              <KeyButton shortcut={SHORTCUTS.sample} onClick={actions.sample} disabled={off('sample', p.busy)}>
                Sample of {p.sampleQty} is on
              </KeyButton>
            ) : null}
            <KeyButton tone={pieceByPiece ? 'primary' : 'quiet'} shortcut={SHORTCUTS.piece} onClick={actions.piece} disabled={off('piece', p.busy)}>
              One more piece is on
            </KeyButton>
            {pieceByPiece ? (
              <KeyButton tone="quiet" shortcut={SHORTCUTS.finishPieces} onClick={actions.finishPieces} disabled={off('finishPieces', p.busy)}>
                Sample complete
              </KeyButton>
            ) : null}
          </div>
          <p className="text-sm text-ink-soft">Building it piece by piece records each piece’s weight, which teaches Tallyforge how much this part varies.</p>
        </div>
      ) : null}
      {work.step === 'grow' ? (
        <div className="space-y-3">
          <h2 id="step-title" className="text-xl font-bold">
            Grow the sample (now {work.sample?.quantity} pcs)
          </h2>
          {p.growPlan?.tooLight ? (
            <p className="font-bold text-fault">Not even one more piece can be counted exactly on this scale.</p>
          ) : (
            <p className="text-lg" data-testid="grow-plan" data-max-add={p.growPlan?.maxAdd ?? 0}>
              You may add up to <span className="num font-bold">{p.growPlan?.maxAdd ?? 0}</span> pieces (pan total{' '}
              <span className="num">{p.growPlan?.maxTotal ?? 0}</span>), then accept.
            </p>
          )}
          <div className="flex flex-wrap gap-2">
            <KeyButton shortcut={SHORTCUTS.grow} onClick={actions.grow} disabled={off('grow', p.busy)}>
              Accept grown sample
            </KeyButton>
            <KeyButton tone="quiet" shortcut={SHORTCUTS.count} onClick={actions.count} disabled={off('count')}>
              Count to target
            </KeyButton>
          </div>
        </div>
      ) : null}
      {work.step === 'count' ? (
        <div className="space-y-3">
          <h2 id="step-title" className="text-xl font-bold">
            {bin ? 'Put the bin on the pan' : 'Add pieces up to the target'}
          </h2>
          {bin ? (
            <ContainerSelect
              containers={p.containers}
              value={work.containerId}
              onChange={p.onContainerChoice}
              label="The bin’s container (its tare comes off)"
            />
          ) : null}
          <KeyButton shortcut={SHORTCUTS.capture} onClick={actions.capture} disabled={off('capture', p.busy || p.captureBlocked !== null)} className="w-full">
            Capture this count
          </KeyButton>
          {p.captureBlocked ? (
            <p className="font-bold text-fault" data-testid="capture-blocked">
              {p.captureBlocked}
            </p>
          ) : null}
          <p className="text-sm text-ink-soft">
            Counts used to sell or bill by quantity need a scale verified for legal trade; this count alone does not make it so.
          </p>
        </div>
      ) : null}
      {work.step === 'captured' ? (
        <div className="space-y-3">
          <h2 id="step-title" className="text-xl font-bold">
            Captured
          </h2>
          <KeyButton shortcut={SHORTCUTS.next} onClick={actions.next} disabled={off('next')}>
            Next count of this part
          </KeyButton>
        </div>
      ) : null}
    </section>
  );
}
