'use client';

import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import type { ReadingSource } from '@/lib/scale/reading';
import { acceptGrowStep } from '@/lib/weighing/grow-sample';
import { judgeKitLine } from '@/lib/weighing/tolerance';
import type { SpreadBelief } from '@/lib/weighing/spread-belief';
import { describeWarning, type WarningCode } from '@/lib/weighing/warnings';
import type { ContainerDto } from '@/server/schemas/containers';
import type { CountEventDto } from '@/server/schemas/counts';
import type { PartDto } from '@/server/schemas/parts';
import type { ScaleDto } from '@/server/schemas/scales';
import { apiFetch } from '@/app/_components/api-client';
import {
  addPieceReading, applyTare, chooseBinContainer, finishPieceSample, goToCount, growSample, markCaptured, nextCount,
  parseSavedWork, pieceIncrements, startWork, takeSample, withCaptureKey, type BenchWork,
} from '../_lib/bench-work';
import { createCaptureQueue, type QueuedCapture, type SendOutcome } from '../_lib/capture-queue';
import { buildCaptureBody } from '../_lib/capture-request';
import type { PipelineWork } from '../_lib/reading-pipeline';
import { planNextGrow, suggestSampleQuantity } from '../_lib/sample-advice';
import { describeSpread } from '../_lib/spread-note';
import { shortcutFor, type ShortcutAction } from '../_lib/shortcuts';
import { sampleStaysOnPan, type WorkItem } from '../_lib/work-item';
import { browserStore, newCaptureKey } from './browser-store';
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
import { StepPanel, type StepActions } from './StepPanel';
import { WarningList } from './WarningList';
import { WorkChooser } from './WorkChooser';
import { useReadingFeed } from './use-reading-feed';

interface Props {
  scales: ScaleDto[];
  containers: ContainerDto[];
  stabilityWindowMs: number;
  defaultPieceSpread: number;
  initialBin: string | null;
}

const WORK_KEY = 'tallyforge.bench.work';
const SCALE_KEY = 'tallyforge.bench.scale';
/** Container put on the practice pan when none is chosen (our demo tray). */
const PRACTICE_TRAY_G = 150;

type Notice = { tone: 'fault' | 'ok' | 'info'; text: string; code?: WarningCode } | null;

export function BenchStation({ scales, containers, stabilityWindowMs, defaultPieceSpread, initialBin }: Props) {
  const [work, setWork] = useState<BenchWork | null>(null);
  const [part, setPart] = useState<PartDto | null>(null);
  const [scaleId, setScaleId] = useState<number | null>(scales[0]?.id ?? null);
  const [source, setSource] = useState<ReadingSource | null>(null);
  const [typed, setTyped] = useState(false);
  const [notice, setNotice] = useState<Notice>(null);
  const [result, setResult] = useState<CountEventDto | null>(null);
  const [queue, setQueue] = useState<QueuedCapture[]>([]);
  const [containerChoice, setContainerChoice] = useState<number | null>(null);
  const [sampleQty, setSampleQty] = useState(10);
  const [busy, setBusy] = useState(false);
  const [restored, setRestored] = useState(false);
  const queueStore = useMemo(() => (typeof window === 'undefined' ? null : createCaptureQueue(browserStore)), []);

  const scale = scales.find((s) => s.id === scaleId) ?? null;
  const pipelineScale = useMemo(
    () => (scale ? { division: scale.division, repeatability: scale.repeatability ?? 0, capacity: scale.capacity, minLoad: scale.minLoad } : null),
    [scale],
  );
  const spread = part?.spreadBelief ?? null;
  // Until the part has learned its spread, the site's cautious value stands in for it.
  const spreadOrAssumed: SpreadBelief = spread ?? { kind: 'assumed', pieceSpread: defaultPieceSpread };
  const chosenContainer = containers.find((c) => c.id === (work?.containerId ?? containerChoice)) ?? null;
  const pipelineWork: PipelineWork = {
    tare: work?.tare ?? work?.panZero ?? 0,
    sample: work && work.step !== 'tare' && work.step !== 'sample' ? work.sample : null,
    sampleOnPan: work ? sampleStaysOnPan(work.purpose) : true,
    targetQuantity: work?.targetQuantity ?? null,
    spread,
    containerWeight: chosenContainer?.tare ?? null,
  };
  const feedOptions = useMemo(() => ({ windowMs: stabilityWindowMs, defaultPieceSpread }), [stabilityWindowMs, defaultPieceSpread]);
  const { frame, frameRef, trace } = useReadingFeed(source, pipelineScale, pipelineWork, feedOptions);

  // Resume a count in progress after a reload.
  useEffect(() => {
    const saved = parseSavedWork(browserStore.getItem(WORK_KEY));
    const savedScale = Number(browserStore.getItem(SCALE_KEY));
    if (saved && scales.some((s) => s.id === saved.scaleId)) {
      setWork(saved);
      setScaleId(saved.scaleId);
      setSampleQty(saved.sample?.quantity ?? 10);
      void apiFetch<{ part: PartDto }>(`/api/v1/parts/${saved.partId}`).then((r) => r.ok && setPart(r.data.part));
    } else if (scales.some((s) => s.id === savedScale)) {
      setScaleId(savedScale);
    }
    setQueue(queueStore?.list() ?? []);
    setRestored(true);
  }, []); // eslint-disable-line react-hooks/exhaustive-deps

  useEffect(() => {
    if (!restored) return;
    if (work) browserStore.setItem(WORK_KEY, JSON.stringify(work));
    else browserStore.removeItem(WORK_KEY);
    if (scaleId !== null) browserStore.setItem(SCALE_KEY, String(scaleId));
  }, [work, scaleId, restored]);

  const sendCapture = useCallback(async (item: QueuedCapture): Promise<SendOutcome> => {
    const res = await apiFetch<{ count: CountEventDto }>('/api/v1/counts', { method: 'POST', body: item.body, headers: { 'Idempotency-Key': item.key } });
    if (res.ok) return { kind: 'sent' };
    if (res.status === 0 || res.status >= 500) return { kind: 'offline' };
    return { kind: 'refused', message: res.message };
  }, []);

  const flushQueue = useCallback(async () => {
    if (!queueStore) return;
    await queueStore.flush(sendCapture);
    setQueue(queueStore.list());
  }, [queueStore, sendCapture]);

  // Waiting captures go out when the network is back, and every little while in case no event comes.
  useEffect(() => {
    const onOnline = () => void flushQueue();
    window.addEventListener('online', onOnline);
    const timer = setInterval(() => queueStore && queueStore.list().length > 0 && void flushQueue(), 5000);
    void flushQueue();
    return () => {
      window.removeEventListener('online', onOnline);
      clearInterval(timer);
    };
  }, [flushQueue, queueStore]);

  const noise = scale ? { division: scale.division, repeatability: scale.repeatability ?? 0 } : null;
  const growPlan = work?.step === 'grow' && work.sample && noise ? planNextGrow({ noise, sample: work.sample, spread: spreadOrAssumed, upTo: work.targetQuantity != null ? work.targetQuantity + (work.tolerance?.above ?? 0) : undefined }) : null;

  const chooseWork = (item: WorkItem) => {
    if (!scale) return;
    void apiFetch<{ part: PartDto }>(`/api/v1/parts/${item.partId}`).then((r) => {
      if (!r.ok) return setNotice({ tone: 'fault', text: r.message });
      const p = r.data.part;
      setPart(p);
      setResult(null);
      setNotice(null);
      const onPan = sampleStaysOnPan(item.purpose);
      setSampleQty(noise ? suggestSampleQuantity({ noise, averagePieceWeight: p.averagePieceWeight, spread: p.spreadBelief ?? { kind: 'assumed', pieceSpread: defaultPieceSpread }, targetQuantity: item.targetQuantity ?? null, sampleOnPan: onPan }) : 10);
      const { orderLineId, binId, binVersion } = item;
      setWork(startWork({ purpose: item.purpose, partId: p.id, partNumber: p.partNumber, label: item.label, scaleId: scale.id, targetQuantity: item.targetQuantity, tolerance: item.tolerance, orderLineId, binId, binVersion }));
    });
  };

  /** The latest frame when it is settled; otherwise say why nothing happened. */
  const settled = () => {
    const f = frameRef.current;
    if (!f) {
      setNotice({ tone: 'fault', text: 'No readings from the scale yet. Connect it first.' });
      return null;
    }
    if (!f.stable) {
      setNotice({ tone: 'fault', text: describeWarning('unstable').message, code: 'unstable' });
      return null;
    }
    // Above Max the indication means nothing (the load cell may be past its linear range): no step takes it.
    if (f.load.level === 'over') {
      setNotice({ tone: 'fault', text: `${describeWarning('over_capacity').message} ${describeWarning('over_capacity').remedy}`, code: 'over_capacity' });
      return null;
    }
    setNotice(null);
    return f;
  };

  const locked = scale?.status === 'locked';
  const captureBlocked = locked
    ? `This scale is locked${scale?.statusReason ? `: ${scale.statusReason}` : ''}. ${describeWarning('scale_locked').remedy}`
    : null;

  const actions: StepActions = {
    tare() {
      const f = settled();
      if (!f || !work) return;
      setWork(applyTare(work, f.mean, containerChoice));
      trace.mark(f.t, 'tare', 'tare');
    },
    presetTare() {
      const c = containers.find((x) => x.id === containerChoice);
      if (!c || !work) return;
      setWork(applyTare(work, c.tare, c.id));
      if (frameRef.current) trace.mark(frameRef.current.t, 'tare', 'preset tare');
    },
    sample() {
      const f = settled();
      if (!f || !work) return;
      const next = takeSample(work, sampleQty, f.mean);
      if (!next.sample || next.sample.netWeight <= 0) return setNotice({ tone: 'fault', text: 'Nothing is on the pan yet: put the sample on, then press again.' });
      setWork(next);
      trace.mark(f.t, 'sample', `sample ${sampleQty}`);
    },
    piece() {
      const f = settled();
      if (!f || !work || !scale) return;
      const last = work.pieceReadings[work.pieceReadings.length - 1] ?? work.tare ?? 0;
      if (f.mean - last < scale.division) return setNotice({ tone: 'fault', text: 'No new piece is on the pan: put exactly one more on, wait for it to settle, and press again.' });
      setWork(addPieceReading(work, f.mean));
    },
    finishPieces() {
      if (!work || work.pieceReadings.length < 3 || !scale) return setNotice({ tone: 'fault', text: 'Put at least two pieces on one at a time first.' });
      const increments = pieceIncrements(work);
      const next = finishPieceSample(work);
      setWork(next);
      if (frameRef.current) trace.mark(frameRef.current.t, 'sample', `sample ${next.sample?.quantity}`);
      void apiFetch<{ part: PartDto; held: boolean }>(`/api/v1/parts/${work.partId}/samples`, {
        method: 'POST',
        body: { scaleId: scale.id, unit: 'g', quantity: increments.length, netWeight: Number(next.sample!.netWeight.toFixed(6)), increments: increments.map((x) => Number(x.toFixed(6))) },
      }).then((r) => {
        if (r.ok && r.data.held) {
          setNotice({ tone: 'info', text: `Sample of ${increments.length} recorded, but held for review: it is far from what this part has weighed before, so the part keeps its piece weight until a planner or quality engineer accepts it. Check that this is the right part.` });
        } else if (r.ok) {
          setPart(r.data.part);
          setNotice({ tone: 'ok', text: `Sample of ${increments.length} recorded piece by piece${r.data.part.spreadLearned ? `; this part’s spread is now learned from ${r.data.part.spreadObservations} pieces` : ''}.` });
        } else {
          const why = Object.values(r.fields ?? {})[0];
          setNotice({ tone: 'fault', text: `The sample was not recorded: ${r.message}${why ? ` — ${why}` : ''}.` });
        }
      });
    },
    grow() {
      const f = frameRef.current;
      if (!f || !work?.sample || !noise) return;
      const state = { sampleQuantity: work.sample.quantity, sampleNet: work.sample.netWeight, spread: spreadOrAssumed, noise };
      const r = acceptGrowStep(state, f.mean - (work.tare ?? 0), f.stable);
      if (r.accepted) {
        setWork(growSample(work, { quantity: r.sampleQuantity, netWeight: r.sampleNet }));
        setNotice({ tone: 'ok', text: `Sample grown to ${r.sampleQuantity} pieces.` });
        trace.mark(f.t, 'grow', `grown ${r.sampleQuantity}`);
      } else if (r.reason === 'unstable') setNotice({ tone: 'fault', text: describeWarning('unstable').message, code: 'unstable' });
      else if (r.reason === 'not_exact') setNotice({ tone: 'fault', text: `Too many pieces were added to count them exactly (${r.count} ± ${r.wholePieceRange}). Take some off, down to the number shown, and accept again.` });
      else setNotice({ tone: 'fault', text: 'No pieces were added since the last step.' });
    },
    count() {
      if (work) setWork(goToCount(work));
    },
    async capture() {
      if (!work || captureBlocked || busy) return;
      const f = settled();
      if (!f) return;
      const keyed = withCaptureKey(work, newCaptureKey);
      setWork(keyed);
      const body = buildCaptureBody(keyed, f.mean);
      setBusy(true);
      const res = await apiFetch<{ count: CountEventDto }>('/api/v1/counts', { method: 'POST', body, headers: { 'Idempotency-Key': keyed.captureKey! } });
      setBusy(false);
      trace.mark(f.t, 'capture', 'capture');
      if (res.ok) {
        setResult(res.data.count);
        setWork(markCaptured(keyed));
      } else if (res.status === 0 || res.status >= 500) {
        queueStore?.add({ key: keyed.captureKey!, body, label: `${keyed.partNumber} · ${frameRef.current?.estimate?.count ?? '?'} pcs`, queuedAt: new Date().toISOString() });
        setQueue(queueStore?.list() ?? []);
        setWork(markCaptured(keyed));
        setNotice({ tone: 'info', text: 'The server cannot be reached. The capture is saved on this tablet and will be sent once the connection is back.' });
      } else {
        setNotice({ tone: 'fault', text: res.message, code: res.code === 'scale_locked' || res.code === 'unstable' || res.code === 'over_capacity' ? res.code : undefined });
      }
    },
    next() {
      if (!work) return;
      setWork(nextCount(work));
      setResult(null);
      setNotice(null);
    },
  };
  const actionsRef = useRef(actions);
  actionsRef.current = actions;

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const action = shortcutFor(e);
      if (!action || action === 'scan') return;
      const allowed: Record<BenchWork['step'], ShortcutAction[]> = {
        tare: ['tare', 'presetTare'],
        sample: ['sample', 'piece', 'finishPieces'],
        grow: ['grow', 'count'],
        count: ['capture'],
        captured: ['next'],
      };
      const step = workStepRef.current;
      if (!step || !allowed[step].includes(action)) return;
      e.preventDefault();
      void actionsRef.current[action as keyof StepActions]();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);
  const workStepRef = useRef<BenchWork['step'] | null>(null);
  workStepRef.current = work?.step ?? null;

  const codes: WarningCode[] = [];
  for (const w of frame?.estimate?.warnings ?? []) codes.push(w.code);
  if (frame?.load.level === 'over' && !codes.includes('over_capacity')) codes.push('over_capacity');
  if (locked) codes.push('scale_locked');
  if (notice?.code && !codes.includes(notice.code)) codes.push(notice.code);

  const verdict = work?.targetQuantity != null && frame?.estimate && (work.step === 'count' || work.step === 'captured')
    ? judgeKitLine({ count: frame.estimate.count, wholePieceRange: frame.estimate.wholePieceRange }, { target: work.targetQuantity, below: work.tolerance?.below ?? 0, above: work.tolerance?.above ?? 0 })
    : null;
  const spreadNote = work && part && noise
    ? describeSpread({ belief: spreadOrAssumed, noise, averagePieceWeight: work.sample ? work.sample.netWeight / work.sample.quantity : part.averagePieceWeight, sampleQuantity: work.sample?.quantity ?? sampleQty, sampleOnPan: sampleStaysOnPan(work.purpose) })
    : null;
  const showing = !work || work.step === 'tare' ? 'gross' : work.step === 'sample' ? 'net' : 'count';
  const kind = scale?.connection.kind;

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
              onContainerChoice={(id) => {
                if (work.purpose === 'bin' && work.step === 'count') setWork(chooseBinContainer(work, id, containers.find((c) => c.id === id)?.tare ?? 0));
                else setContainerChoice(id);
              }}
              sampleQty={sampleQty}
              onSampleQty={setSampleQty}
              growPlan={growPlan}
              busy={busy}
              captureBlocked={captureBlocked}
            />
          ) : null}
          {result ? <CaptureResult count={result} /> : null}
          {work ? (
            <button type="button" className="btn-quiet" onClick={() => { setWork(null); setResult(null); setNotice(null); }}>Stop this count and choose other work</button>
          ) : null}
          {scale ? <LiveTrace trace={trace} frameRef={frameRef} division={scale.division} windowMs={stabilityWindowMs} /> : null}
        </div>
        <aside className="min-w-0 space-y-4">
          <QueuePanel items={queue} onSend={() => void flushQueue()} onDrop={(key) => { queueStore?.remove(key); setQueue(queueStore?.list() ?? []); }} />
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
