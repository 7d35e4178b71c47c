/**
 * The bench's one owner of side effects: it keeps the count in progress (moved only through the
 * state machine in _lib/bench-machine.ts), restores and saves it, sends captures or queues them
 * offline, records pieces-by-piece samples, marks the trace and reads the keys. BenchStation only
 * lays out what this returns.
 */
import { useCallback, useEffect, useEffectEvent, useMemo, useState } from 'react';
import type { ReadingSource } from '@/lib/scale/reading';
import { acceptGrowStep } from '@/lib/weighing/grow-sample';
import type { SpreadBelief } from '@/lib/weighing/spread-belief';
import { judgeKitLine } from '@/lib/weighing/tolerance';
import { describeWarning, type WarningCode } from '@/lib/weighing/warnings';
import type { ContainerDto } from '@/lib/contracts/containers';
import type { CountEventDto } from '@/lib/contracts/counts';
import type { PartDto } from '@/lib/contracts/parts';
import type { ScaleDto } from '@/lib/contracts/scales';
import { apiFetch } from '@/app/_components/api-client';
import { useSiteTime } from '@/app/_components/site-time';
import { calibrationOverdue } from '@/lib/metrology/calibration-due';
import { allows, canMoveScale, canUseKept, captureDone, move, moveScale, takeKept, type BenchEvent } from '../_lib/bench-machine';
import {
  chooseBinContainer,
  keepSample,
  parseKeptSample,
  parseSavedWork,
  pieceIncrements,
  readingScaleId,
  sampleOnPan,
  startWork,
  type BenchWork,
  type KeptSample,
} from '../_lib/bench-work';
import { createCaptureQueue, type QueuedCapture, type SendOutcome } from '../_lib/capture-queue';
import { buildCaptureBody } from '../_lib/capture-request';
import type { PipelineWork } from '../_lib/reading-pipeline';
import { DEFAULT_SAMPLE_QUANTITY, planNextGrow } from '../_lib/sample-advice';
import { adviseScales, judgeScale, type AdvisedScale } from '../_lib/scale-advice';
import { shortcutFor } from '../_lib/shortcuts';
import { describeSpread } from '../_lib/spread-note';
import { sampleStaysOnPan, type WorkItem } from '../_lib/work-item';
import { newRequestKey } from '@/app/_components/request-key';
import { browserStore } from './browser-store';
import type { StepActions } from './StepPanel';
import { useReadingFeed } from './use-reading-feed';

export interface BenchOptions {
  scales: ScaleDto[];
  containers: ContainerDto[];
  stabilityWindowMs: number;
  defaultPieceSpread: number;
}

const WORK_KEY = 'tallyforge.bench.work';
/** How often the bench asks for its scale's status (a lock-out shows within this). */
const SCALE_STATUS_POLL_MS = 3000;
const SCALE_KEY = 'tallyforge.bench.scale';
/** One sample kept when a count was stopped, for the next count of its part on this tablet. */
const KEPT_KEY = 'tallyforge.bench.kept';

export type Notice = { tone: 'fault' | 'ok' | 'info'; text: string; code?: WarningCode } | null;

// One capture request, whether sent at once or replayed from the offline queue; the key makes a retry safe.
function postCapture(key: string, body: unknown) {
  return apiFetch<CaptureAnswer>('/api/v1/counts', { method: 'POST', body, headers: { 'Idempotency-Key': key } });
}

function advisedScale(s: ScaleDto): AdvisedScale {
  return {
    id: s.id,
    name: s.name,
    division: s.division,
    repeatability: s.repeatability ?? 0,
    capacity: s.capacity,
    minLoad: s.minLoad,
    locked: s.status === 'locked',
  };
}

/** What the server answers a capture: the count, and for a bin count what became of the bin. */
export interface CaptureAnswer {
  count: CountEventDto;
  binCount: { bookQuantity: number; counted: number; variance: number; status: string } | null;
}

/** The steps that take a steady reading. */
export type SteadyAction = 'tare' | 'sample' | 'piece' | 'grow' | 'capture';

export const STEADY_ACTION_WORDS: Readonly<Record<SteadyAction, string>> = {
  tare: 'tare',
  sample: 'take the sample',
  piece: 'take the piece',
  grow: 'accept the grown sample',
  capture: 'capture the count',
};

export function useBench({ scales, containers, stabilityWindowMs, defaultPieceSpread }: BenchOptions) {
  const [work, setWork] = useState<BenchWork | null>(null);
  const [part, setPart] = useState<PartDto | null>(null);
  const [scaleId, setScaleId] = useState<number | null>(scales[0]?.id ?? null);
  const [source, setSource] = useState<ReadingSource | null>(null);
  const [typed, setTyped] = useState(false);
  const [notice, setNotice] = useState<Notice>(null);
  const [result, setResult] = useState<CaptureAnswer | null>(null);
  const [queue, setQueue] = useState<QueuedCapture[]>([]);
  const [containerChoice, setContainerChoice] = useState<number | null>(null);
  const [sampleQty, setSampleQty] = useState(10);
  const [busy, setBusy] = useState(false);
  const [restored, setRestored] = useState(false);
  /** A step pressed while the reading still moved: it acts on the first steady reading. */
  const [waiting, setWaiting] = useState<SteadyAction | null>(null);
  const [kept, setKept] = useState<KeptSample | null>(null);
  const queueStore = useMemo(() => (typeof window === 'undefined' ? null : createCaptureQueue(browserStore)), []);

  // The chosen scale's status as the server has it now: a lock-out (or its lifting) made elsewhere
  // reaches an open bench within a few seconds.
  const [live, setLive] = useState<Pick<ScaleDto, 'id' | 'status' | 'statusReason'> | null>(null);
  useEffect(() => {
    if (scaleId === null) return;
    let on = true;
    const poll = async () => {
      const r = await apiFetch<{ scale: ScaleDto }>(`/api/v1/scales/${scaleId}`);
      if (on && r.ok)
        setLive((prev) =>
          prev && prev.id === r.data.scale.id && prev.status === r.data.scale.status && prev.statusReason === r.data.scale.statusReason ? prev : r.data.scale,
        );
    };
    void poll();
    const timer = setInterval(() => void poll(), SCALE_STATUS_POLL_MS);
    return () => {
      on = false;
      clearInterval(timer);
    };
  }, [scaleId]);
  const scalesNow = useMemo(
    () =>
      scales.map((s) =>
        live && s.id === live.id && (s.status !== live.status || s.statusReason !== live.statusReason)
          ? { ...s, status: live.status, statusReason: live.statusReason }
          : s,
      ),
    [scales, live],
  );
  const scale = scalesNow.find((s) => s.id === scaleId) ?? null;
  // The feed restarts only when what it computes with changes, not when the status does.
  const [division, repeatability, capacity, minLoad] = [scale?.division, scale?.repeatability ?? 0, scale?.capacity, scale?.minLoad];
  const pipelineScale = useMemo(
    () => (division !== undefined && capacity !== undefined && minLoad !== undefined ? { division, repeatability, capacity, minLoad } : null),
    [division, repeatability, capacity, minLoad],
  );
  const spread = part?.spreadBelief ?? null;
  // Until the part has learned its spread, the site's cautious value stands in for it.
  const spreadOrAssumed: SpreadBelief = useMemo(() => spread ?? { kind: 'assumed', pieceSpread: defaultPieceSpread }, [spread, defaultPieceSpread]);
  const chosenContainer = containers.find((c) => c.id === (work?.containerId ?? containerChoice)) ?? null;
  const pipelineWork: PipelineWork = {
    tare: work?.tare ?? work?.panZero ?? 0,
    sample: work && work.step !== 'tare' && work.step !== 'sample' ? work.sample : null,
    sampleOnPan: work ? sampleOnPan(work) : true,
    targetQuantity: work?.targetQuantity ?? null,
    spread,
    containerWeight: chosenContainer?.tare ?? null,
  };
  const feedOptions = useMemo(() => ({ windowMs: stabilityWindowMs, defaultPieceSpread }), [stabilityWindowMs, defaultPieceSpread]);
  const { frame, frameRef, trace } = useReadingFeed(source, pipelineScale, pipelineWork, feedOptions);

  // Resume a count in progress after a reload (once, after hydration: the server render has no storage).
  const restore = useEffectEvent(() => {
    const saved = parseSavedWork(browserStore.getItem(WORK_KEY));
    const savedScale = Number(browserStore.getItem(SCALE_KEY));
    if (saved && scales.some((s) => s.id === saved.scaleId)) {
      setWork(saved);
      setScaleId(readingScaleId(saved));
      setSampleQty(saved.sample?.quantity ?? 10);
      void apiFetch<{ part: PartDto }>(`/api/v1/parts/${saved.partId}`).then((r) => r.ok && setPart(r.data.part));
    } else if (scales.some((s) => s.id === savedScale)) {
      setScaleId(savedScale);
    }
    setQueue(queueStore?.list() ?? []);
    setKept(parseKeptSample(browserStore.getItem(KEPT_KEY)));
    setRestored(true);
  });
  useEffect(() => restore(), []);

  useEffect(() => {
    if (!restored) return;
    if (work) browserStore.setItem(WORK_KEY, JSON.stringify(work));
    else browserStore.removeItem(WORK_KEY);
    if (scaleId !== null) browserStore.setItem(SCALE_KEY, String(scaleId));
  }, [work, scaleId, restored]);

  const sendCapture = useCallback(async (item: QueuedCapture): Promise<SendOutcome> => {
    const res = await postCapture(item.key, item.body);
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

  // The page renders with every animation frame of readings: advice that does not depend on the
  // reading is worked out only when what it does depend on changes.
  const noise = useMemo(() => (scale ? { division: scale.division, repeatability: scale.repeatability ?? 0 } : null), [scale]);
  const growPlan = useMemo(
    () =>
      work?.step === 'grow' && work.sample && noise
        ? planNextGrow({
            noise,
            sample: work.sample,
            spread: spreadOrAssumed,
            upTo: work.targetQuantity != null ? work.targetQuantity + (work.tolerance?.above ?? 0) : undefined,
          })
        : null,
    [work, noise, spreadOrAssumed],
  );

  const chooseWork = (item: WorkItem) => {
    if (!scale) return;
    void apiFetch<{ part: PartDto }>(`/api/v1/parts/${item.partId}`).then((r) => {
      if (!r.ok) return setNotice({ tone: 'fault', text: r.message });
      const p = r.data.part;
      setPart(p);
      setResult(null);
      setNotice(null);
      const onPan = sampleStaysOnPan(item.purpose);
      const spreadOf = p.spreadBelief ?? { kind: 'assumed' as const, pieceSpread: defaultPieceSpread };
      setSampleQty(
        p.averagePieceWeight
          ? judgeScale(advisedScale(scale), { averagePieceWeight: p.averagePieceWeight, spread: spreadOf }, item.targetQuantity ?? null, onPan).sample
          : DEFAULT_SAMPLE_QUANTITY,
      );
      const { orderLineId, binId, binVersion } = item;
      setWork(
        startWork({
          purpose: item.purpose,
          partId: p.id,
          partNumber: p.partNumber,
          label: item.label,
          scaleId: scale.id,
          targetQuantity: item.targetQuantity,
          tolerance: item.tolerance,
          orderLineId,
          binId,
          binVersion,
        }),
      );
    });
  };

  /** The latest frame when it is settled; otherwise say why nothing happened. */
  /**
   * The latest frame when it is settled. A press while the reading still moves is not refused: it
   * waits, visibly and cancellably, and acts on the first steady reading.
   */
  const settled = (action: SteadyAction) => {
    const f = frameRef.current;
    if (!f) {
      setNotice({ tone: 'fault', text: 'No readings from the scale yet. Connect it first.' });
      return null;
    }
    if (!f.stable) {
      setWaiting(action);
      setNotice(null);
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

  const { today } = useSiteTime();
  const overdue = scale ? calibrationOverdue(scale.calibrationDueAt, today()) : false;
  const locked = scale?.status === 'locked';
  const captureBlocked =
    overdue && !locked
      ? `This scale was due for calibration on ${scale!.calibrationDueAt} and may not be used until a passing test is recorded. ${describeWarning('scale_locked').remedy}`
      : locked
        ? `This scale is locked${scale?.statusReason ? `: ${scale.statusReason}` : ''}. ${describeWarning('scale_locked').remedy}`
        : null;

  /** Takes a move of the machine: the new work, or the reason it was refused as the notice. */
  const apply = (event: BenchEvent): BenchWork | null => {
    if (!work) return null;
    const m = move(work, event);
    if (!m.ok) {
      setNotice({ tone: 'fault', text: m.reason });
      return null;
    }
    setWork(m.work);
    return m.work;
  };

  const actions: StepActions = {
    tare() {
      const f = settled('tare');
      if (f && apply({ action: 'tare', stableGross: f.mean, containerId: containerChoice })) trace.mark(f.t, 'tare', 'tare');
    },
    presetTare() {
      const c = containers.find((x) => x.id === containerChoice);
      if (!c) return setNotice({ tone: 'fault', text: 'Choose the container first.' });
      if (apply({ action: 'presetTare', containerId: c.id, containerTare: c.tare }) && frameRef.current) trace.mark(frameRef.current.t, 'tare', 'preset tare');
    },
    sample() {
      const f = settled('sample');
      if (f && apply({ action: 'sample', quantity: sampleQty, stableGross: f.mean })) trace.mark(f.t, 'sample', `sample ${sampleQty}`);
    },
    piece() {
      const f = settled('piece');
      if (f && scale) apply({ action: 'piece', stableGross: f.mean, division: scale.division });
    },
    finishPieces() {
      if (!work || !scale) return;
      const increments = pieceIncrements(work);
      const next = apply({ action: 'finishPieces' });
      if (!next) return;
      if (frameRef.current) trace.mark(frameRef.current.t, 'sample', `sample ${next.sample?.quantity}`);
      void apiFetch<{ part: PartDto; held: boolean }>(`/api/v1/parts/${work.partId}/samples`, {
        method: 'POST',
        body: {
          scaleId: scale.id,
          unit: 'g',
          quantity: increments.length,
          netWeight: Number(next.sample!.netWeight.toFixed(6)),
          increments: increments.map((x) => Number(x.toFixed(6))),
        },
      }).then((r) => {
        if (r.ok && r.data.held) {
          setNotice({
            tone: 'info',
            text: `Sample of ${increments.length} recorded, but held for review: it is far from what this part has weighed before, so the part keeps its piece weight until a planner or quality engineer accepts it. Check that this is the right part.`,
          });
        } else if (r.ok) {
          setPart(r.data.part);
          setNotice({
            tone: 'ok',
            text: `Sample of ${increments.length} recorded piece by piece${r.data.part.spreadLearned ? `; this part’s spread is now learned from ${r.data.part.spreadObservations} pieces` : ''}.`,
          });
        } else {
          const why = Object.values(r.fields ?? {})[0];
          setNotice({ tone: 'fault', text: `The sample was not recorded: ${r.message}${why ? ` — ${why}` : ''}.` });
        }
      });
    },
    grow() {
      const f = settled('grow');
      if (!f || !work?.sample || !noise) return;
      const state = { sampleQuantity: work.sample.quantity, sampleNet: work.sample.netWeight, spread: spreadOrAssumed, noise };
      const r = acceptGrowStep(state, f.mean - (work.tare ?? 0), f.stable);
      if (r.accepted) {
        if (!apply({ action: 'grow', sample: { quantity: r.sampleQuantity, netWeight: r.sampleNet } })) return;
        setNotice({ tone: 'ok', text: `Sample grown to ${r.sampleQuantity} pieces.` });
        trace.mark(f.t, 'grow', `grown ${r.sampleQuantity}`);
      } else if (r.reason === 'unstable') setNotice({ tone: 'fault', text: describeWarning('unstable').message, code: 'unstable' });
      else if (r.reason === 'not_exact')
        setNotice({
          tone: 'fault',
          text: `Too many pieces were added to count them exactly (${r.count} ± ${r.wholePieceRange}). Take some off, down to the number shown, and accept again.`,
        });
      else setNotice({ tone: 'fault', text: 'No pieces were added since the last step.' });
    },
    count() {
      apply({ action: 'count' });
    },
    async capture() {
      if (!work || captureBlocked || busy) return;
      const f = settled('capture');
      if (!f) return;
      const keyed = apply({ action: 'capture', makeKey: newRequestKey });
      if (!keyed) return;
      const body = buildCaptureBody(keyed, f.mean);
      setBusy(true);
      const res = await postCapture(keyed.captureKey!, body);
      setBusy(false);
      if (res.ok) {
        // Only a capture the server took (or the queue holds) is marked on the trace.
        trace.mark(f.t, 'capture', 'capture');
        setResult(res.data);
        setWork(captureDone(keyed));
      } else if (res.status === 0 || res.status >= 500) {
        trace.mark(f.t, 'capture', 'queued');
        queueStore?.add({
          key: keyed.captureKey!,
          body,
          label: `${keyed.partNumber} · ${frameRef.current?.estimate?.count ?? '?'} pcs`,
          queuedAt: new Date().toISOString(),
        });
        setQueue(queueStore?.list() ?? []);
        setWork(captureDone(keyed));
        setNotice({ tone: 'info', text: 'The server cannot be reached. The capture is saved on this tablet and will be sent once the connection is back.' });
      } else {
        // The server's own reason, with the field it names, in the operator's words.
        const why = Object.values(res.fields ?? {})[0];
        setNotice({
          tone: 'fault',
          text: why ? `${res.message}: ${why}.` : res.message,
          code: res.code === 'scale_locked' || res.code === 'unstable' || res.code === 'over_capacity' ? res.code : undefined,
        });
      }
    },
    next() {
      if (!apply({ action: 'next' })) return;
      setResult(null);
      setNotice(null);
    },
  };
  // Keys act on whatever the machine allows now (the same list the step panel shows).
  const onKey = useEffectEvent((e: KeyboardEvent) => {
    const action = shortcutFor(e);
    if (!action || action === 'scan' || !allows(work, action)) return;
    e.preventDefault();
    void actions[action]();
  });
  useEffect(() => {
    const listener = (e: KeyboardEvent) => onKey(e);
    window.addEventListener('keydown', listener);
    return () => window.removeEventListener('keydown', listener);
  }, []);
  // A press made while the reading moved runs once it settles.
  const runWaiting = useEffectEvent((action: SteadyAction) => void actions[action]());

  const codes: WarningCode[] = [];
  for (const w of frame?.estimate?.warnings ?? []) codes.push(w.code);
  if (frame?.load.level === 'over' && !codes.includes('over_capacity')) codes.push('over_capacity');
  if (locked || overdue) codes.push('scale_locked');
  if (notice?.code && !codes.includes(notice.code)) codes.push(notice.code);

  const verdict =
    work?.targetQuantity != null && frame?.estimate && (work.step === 'count' || work.step === 'captured')
      ? judgeKitLine(
          { count: frame.estimate.count, wholePieceRange: frame.estimate.wholePieceRange },
          { target: work.targetQuantity, below: work.tolerance?.below ?? 0, above: work.tolerance?.above ?? 0 },
        )
      : null;
  const spreadNote = useMemo(
    () =>
      work && part && noise
        ? describeSpread({
            belief: spreadOrAssumed,
            noise,
            averagePieceWeight: work.sample ? work.sample.netWeight / work.sample.quantity : part.averagePieceWeight,
            sampleQuantity: work.sample?.quantity ?? sampleQty,
            sampleOnPan: sampleOnPan(work),
          })
        : null,
    [work, part, noise, spreadOrAssumed, sampleQty],
  );
  // Before the count: can this scale count this part, and would another of the bench serve better?
  const advice = useMemo(() => {
    const apwKnown = work?.sample ? work.sample.netWeight / work.sample.quantity : (part?.averagePieceWeight ?? null);
    if (!work || !scale || !apwKnown || (work.step !== 'tare' && work.step !== 'sample')) return null;
    return adviseScales(
      scalesNow.map(advisedScale),
      scale.id,
      { averagePieceWeight: apwKnown, spread: spreadOrAssumed },
      work.targetQuantity,
      sampleOnPan(work),
      chosenContainer?.tare ?? 0,
    );
  }, [work, part, scale, scalesNow, spreadOrAssumed, chosenContainer]);
  const showing: 'gross' | 'net' | 'count' = !work || work.step === 'tare' ? 'gross' : work.step === 'sample' ? 'net' : 'count';
  const kind = scale?.connection.kind;

  useEffect(() => {
    if (!waiting || !frame?.stable) return;
    setWaiting(null);
    runWaiting(waiting);
  }, [waiting, frame?.stable]);
  // A waiting press belongs to the step it was made in.
  useEffect(() => setWaiting(null), [work?.step, work?.partId]);
  const cancelWaiting = () => setWaiting(null);

  /**
   * Another scale of the bench for the rest of the count (a bigger one for the bulk): the sample
   * learned so far goes with it. The live count reads the new scale's noise for both weighings,
   * which errs on the cautious side; the server counts the capture with each scale's own.
   */
  const moveToScale = (id: number) => {
    if (!work) return setScaleId(id);
    const m = moveScale(work, id);
    if (!m.ok) return setNotice({ tone: 'fault', text: m.reason });
    const to = scalesNow.find((s) => s.id === id);
    setWork(m.work);
    setScaleId(id);
    setResult(null);
    setNotice({
      tone: 'info',
      text: `The count moves to ${to?.name ?? 'the other scale'} and keeps its sample of ${work.sample!.quantity} pieces. Tare there first, then put the sample and the rest on.`,
    });
  };
  const scaleChoice: 'free' | 'move' | 'fixed' = !work ? 'free' : canMoveScale(work) ? 'move' : 'fixed';

  const chooseContainer = (id: number | null) => {
    if (work?.purpose === 'bin' && work.step === 'count') setWork(chooseBinContainer(work, id, containers.find((c) => c.id === id)?.tare ?? 0));
    else setContainerChoice(id);
  };
  /** Stop the count; with `keep`, its sample stays on this tablet for the part's next count. */
  const stop = ({ keep }: { keep: boolean } = { keep: false }) => {
    const saved = keep && work ? keepSample(work, new Date()) : null;
    if (saved) {
      browserStore.setItem(KEPT_KEY, JSON.stringify(saved));
      setKept(saved);
    }
    setWork(null);
    setResult(null);
    setNotice(
      saved
        ? { tone: 'ok', text: `The sample of ${saved.sample.quantity} pieces of ${work!.partNumber} is kept: the next count of it can start from it.` }
        : null,
    );
  };
  const keptForWork = canUseKept(work, kept) ? kept : null;
  const startFromKeptSample = () => {
    if (!work || scaleId === null) return;
    const m = takeKept(work, kept, scaleId);
    if (!m.ok) return setNotice({ tone: 'fault', text: m.reason });
    setWork(m.work);
    setNotice({
      tone: 'info',
      text: `Counting from the kept sample of ${m.work.sample!.quantity} pieces. Tare the container, then put on the pieces to count (the sample’s pieces are not part of this count).`,
    });
  };
  const dropQueued = (key: string) => {
    queueStore?.remove(key);
    setQueue(queueStore?.list() ?? []);
  };

  return {
    work,
    part,
    scale,
    scaleId,
    moveToScale,
    scaleChoice,
    source,
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
  };
}
