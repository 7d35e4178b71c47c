'use client';

import { useState } from 'react';
import type { ContainerDto } from '@/lib/contracts/containers';
import type { ScaleDto } from '@/lib/contracts/scales';
import { ConfirmBar, type PendingConfirm } from '@/app/_components/confirm-bar';
import type { BenchWork } from '../_lib/bench-work';
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
import { ScaleAdviceNote } from './ScaleAdviceNote';
import { StepPanel } from './StepPanel';
import { WarningList } from './WarningList';
import { WorkChooser } from './WorkChooser';
import { STEADY_ACTION_WORDS, useBench } from './use-bench';

interface Props {
  scales: ScaleDto[];
  containers: ContainerDto[];
  stabilityWindowMs: number;
  defaultPieceSpread: number;
  initialBin: string | null;
  blindCycleCounts: boolean;
}

/** Container put on the practice pan when none is chosen (our demo tray). */
const PRACTICE_TRAY_G = 150;

/**
 * Stopping throws the count in progress away: where there is something to lose, it asks first,
 * saying what, and offers to keep a part's sample for its next count.
 */
function StopCount({ work, onStop }: { work: BenchWork; onStop(o: { keep: boolean }): void }) {
  const [pending, setPending] = useState<PendingConfirm | null>(null);
  const atStake = work.step !== 'tare' && work.step !== 'captured';
  const lost = work.sample ? 'What is on the pan will not be recorded.' : 'The tare taken for it will not be recorded.';
  const keepable = work.sample !== null && work.purpose !== 'bin' && work.step !== 'captured';
  const ask = (): PendingConfirm => ({
    question: `Stop this count? ${lost}`,
    yes: keepable ? 'Stop and discard the sample' : 'Yes, stop and choose other work',
    onConfirm: () => onStop({ keep: false }),
    alternative: keepable ? { label: `Stop, keep the sample of ${work.sample!.quantity} pieces`, onChoose: () => onStop({ keep: true }) } : undefined,
  });
  if (pending) return <ConfirmBar pending={pending} onDone={() => setPending(null)} />;
  return (
    <button type="button" className="btn-quiet" onClick={() => (atStake || keepable ? setPending(ask()) : onStop({ keep: false }))}>
      Stop this count and choose other work
    </button>
  );
}

// The bench's layout; what it shows and does comes from useBench.
export function BenchStation({ scales, containers, stabilityWindowMs, defaultPieceSpread, initialBin, blindCycleCounts }: Props) {
  const {
    work,
    part,
    scale,
    scaleId,
    moveToScale,
    scaleChoice,
    setSource,
    typed,
    setTyped,
    kind,
    frame,
    frameRef,
    trace,
    notice,
    codes,
    spreadNote,
    verdict,
    showing,
    actions,
    chooseWork,
    chooseContainer,
    containerChoice,
    chosenContainer,
    sampleQty,
    setSampleQty,
    growPlan,
    busy,
    captureBlocked,
    result,
    stop,
    keptForWork,
    startFromKeptSample,
    queue,
    flushQueue,
    dropQueued,
    waiting,
    cancelWaiting,
    scales: scalesNow,
    advice,
  } = useBench({ scales, containers, stabilityWindowMs, defaultPieceSpread });

  return (
    <div className="space-y-4">
      <header className="flex flex-wrap items-baseline justify-between gap-2">
        <h1 className="page-title">Bench</h1>
        {work ? (
          <p className="text-lg">
            <span className="font-bold">{work.label}</span>
            <span className="ml-2 rounded bg-paper-deep px-2 py-0.5 text-sm">
              {{ bin: 'bin count', part: 'part count', kit_line: 'kit line' }[work.purpose]}
            </span>
            {work.targetQuantity != null ? (
              <span className="ml-2 text-ink-soft">
                target {work.targetQuantity} (−{work.tolerance?.below ?? 0}/+{work.tolerance?.above ?? 0})
              </span>
            ) : null}
          </p>
        ) : null}
      </header>
      <div className="grid grid-cols-[minmax(0,1fr)] gap-4 lg:grid-cols-[minmax(0,1fr)_24rem]">
        {/* In one column (tablets) this column's pieces join the grid itself, so the pinned reading
            stays on screen over the scale panel and the practice pan too. */}
        <div className="contents lg:block lg:min-w-0 lg:space-y-4">
          <CountReadout frame={frame} division={scale?.division ?? 1} showing={showing} targetQuantity={work?.targetQuantity ?? null} verdict={verdict} />
          {waiting ? (
            <p
              role="status"
              data-testid="waiting"
              className="flex flex-wrap items-center justify-between gap-2 rounded-md bg-forge-light px-4 py-3 text-lg text-forge-dark"
            >
              <span>Waiting for a steady reading to {STEADY_ACTION_WORDS[waiting]}… keep hands off the pan.</span>
              <button type="button" className="btn-quiet" onClick={cancelWaiting}>
                Cancel
              </button>
            </p>
          ) : null}
          {notice && !notice.code ? (
            <p
              role="status"
              data-testid="notice"
              className={`rounded-md px-4 py-3 text-lg ${notice.tone === 'fault' ? 'bg-fault-light text-fault' : notice.tone === 'ok' ? 'bg-ok-light text-ok' : 'bg-forge-light text-forge-dark'}`}
            >
              {notice.text}
            </p>
          ) : null}
          <WarningList codes={codes} />
          {advice ? <ScaleAdviceNote advice={advice} target={work?.targetQuantity ?? null} /> : null}
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
              kept={keptForWork}
              onUseKept={startFromKeptSample}
            />
          ) : null}
          {result ? <CaptureResult answer={result} /> : null}
          {work ? <StopCount work={work} onStop={stop} /> : null}
          {scale ? <LiveTrace trace={trace} frameRef={frameRef} division={scale.division} windowMs={stabilityWindowMs} /> : null}
        </div>
        <aside className="min-w-0 space-y-4">
          <QueuePanel items={queue} onSend={() => void flushQueue()} onDrop={dropQueued} />
          {!work ? <WorkChooser onChoose={chooseWork} disabled={!scale} initialBin={initialBin} blindCycleCounts={blindCycleCounts} /> : null}
          <ScalePicker
            scales={scalesNow}
            scaleId={scaleId}
            choice={scaleChoice}
            sampleScaleId={work?.bulkScaleId != null ? work.scaleId : null}
            onPick={moveToScale}
          />
          {scale ? (
            <label className="flex min-h-11 items-center gap-3">
              <input
                type="checkbox"
                className="h-5 w-5"
                checked={typed || kind === 'keyed'}
                disabled={kind === 'keyed'}
                onChange={(e) => setTyped(e.target.checked)}
              />
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
