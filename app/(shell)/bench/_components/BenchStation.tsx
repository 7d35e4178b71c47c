'use client';

import type { ContainerDto } from '@/server/schemas/containers';
import type { ScaleDto } from '@/server/schemas/scales';
import { CaptureResult } from './CaptureResult';
import { CountReadout } from './CountReadout';
import { KeyedEntry } from './KeyedEntry';
import { LiveTrace } from './LiveTrace';
import { LoadNotes } from './LoadNotes';
import { PracticePanel } from './PracticePanel';
import { QueuePanel } from './QueuePanel';
import { RawAdcWizard } from './RawAdcWizard';
import { ScalePicker } from './ScalePicker';
import { SerialConnect } from './SerialConnect';
import { StepPanel } from './StepPanel';
import { WarningList } from './WarningList';
import { WorkChooser } from './WorkChooser';
import { useBench } from './use-bench';

interface Props {
  scales: ScaleDto[];
  containers: ContainerDto[];
  stabilityWindowMs: number;
  defaultPieceSpread: number;
  initialBin: string | null;
}

/** Container put on the practice pan when none is chosen (our demo tray). */
const PRACTICE_TRAY_G = 150;

// The bench's layout; what it shows and does comes from useBench.
export function BenchStation({ scales, containers, stabilityWindowMs, defaultPieceSpread, initialBin }: Props) {
  const {
    work, part, scale, scaleId, setScaleId, setSource, typed, setTyped, kind,
    frame, frameRef, trace, notice, codes, spreadNote, verdict, showing,
    actions, chooseWork, chooseContainer, containerChoice, chosenContainer, sampleQty, setSampleQty, growPlan,
    busy, captureBlocked, result, stop, queue, flushQueue, dropQueued,
  } = useBench({ scales, containers, stabilityWindowMs, defaultPieceSpread });

  return (
    <div className="space-y-4">
      <header className="flex flex-wrap items-baseline justify-between gap-2">
        <h1 className="page-title">Bench</h1>
        {work ? (
          <p className="text-lg">
            <span className="font-bold">{work.label}</span>
            <span className="ml-2 rounded bg-paper-deep px-2 py-0.5 text-sm">{{ bin: 'bin count', part: 'part count', kit_line: 'kit line' }[work.purpose]}</span>
            {work.targetQuantity != null ? <span className="ml-2 text-ink-soft">target {work.targetQuantity} (−{work.tolerance?.below ?? 0}/+{work.tolerance?.above ?? 0})</span> : null}
          </p>
        ) : null}
      </header>
      <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_24rem]">
        <div className="min-w-0 space-y-4">
          <CountReadout frame={frame} division={scale?.division ?? 1} showing={showing} targetQuantity={work?.targetQuantity ?? null} verdict={verdict} />
          {notice && !notice.code ? (
            <p role="status" data-testid="notice" className={`rounded-md px-4 py-3 text-lg ${notice.tone === 'fault' ? 'bg-fault-light text-fault' : notice.tone === 'ok' ? 'bg-ok-light text-ok' : 'bg-forge-light text-forge-dark'}`}>{notice.text}</p>
          ) : null}
          <WarningList codes={codes} />
          {spreadNote ? (
            <p data-testid="spread-note" className="rounded-md bg-paper-deep px-4 py-2 text-sm">
              {spreadNote.headline}.{spreadNote.more ? ` ${spreadNote.more}` : ''}
            </p>
          ) : null}
          {scale ? <LoadNotes capacity={scale.capacity} load={frame?.load ?? null} /> : null}
          {work ? (
            <StepPanel
              work={work}
              actions={actions}
              containers={containers}
              containerChoice={work.purpose === 'bin' ? work.containerId : containerChoice}
              onContainerChoice={chooseContainer}
              sampleQty={sampleQty}
              onSampleQty={setSampleQty}
              growPlan={growPlan}
              busy={busy}
              captureBlocked={captureBlocked}
            />
          ) : null}
          {result ? <CaptureResult count={result} /> : null}
          {work ? (
            <button type="button" className="btn-quiet" onClick={stop}>Stop this count and choose other work</button>
          ) : null}
          {scale ? <LiveTrace trace={trace} frameRef={frameRef} division={scale.division} windowMs={stabilityWindowMs} /> : null}
        </div>
        <aside className="min-w-0 space-y-4">
          <QueuePanel items={queue} onSend={() => void flushQueue()} onDrop={dropQueued} />
          {!work ? <WorkChooser onChoose={chooseWork} disabled={!scale} initialBin={initialBin} /> : null}
          <ScalePicker scales={scales} scaleId={scaleId} locked={work !== null} onPick={setScaleId} />
          {scale ? (
            <label className="flex min-h-11 items-center gap-3">
              <input type="checkbox" className="h-5 w-5" checked={typed || kind === 'keyed'} disabled={kind === 'keyed'} onChange={(e) => setTyped(e.target.checked)} />
              Type weights instead of reading the scale
            </label>
          ) : null}
          {scale && (typed || kind === 'keyed') ? <KeyedEntry key={`keyed-${scale.id}`} onSource={setSource} /> : null}
          {scale && !typed && kind === 'simulator' ? (
            <PracticePanel key={`sim-${scale.id}`} scale={scale} part={part} containerWeight={chosenContainer?.tare ?? PRACTICE_TRAY_G} onSource={setSource} />
          ) : null}
          {scale && !typed && kind === 'serial' ? <SerialConnect key={`serial-${scale.id}`} scale={scale} onSource={setSource} /> : null}
          {scale && !typed && kind === 'raw_adc' ? <RawAdcWizard key={`adc-${scale.id}`} scale={scale} onSource={setSource} /> : null}
        </aside>
      </div>
    </div>
  );
}
