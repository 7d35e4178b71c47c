/**
 * The count in progress as plain data, and the steps that move it on. Everything needed to
 * resume after a reload lives here, so it is saved as it is after each change.
 */
import { sampleStaysOnPan, type ToleranceBand, type WorkPurpose, type WorkTarget } from './work-item';

export type BenchStep = 'tare' | 'sample' | 'grow' | 'count' | 'captured';

export interface BenchSample {
  quantity: number;
  /** Net sample weight, grams. */
  netWeight: number;
}

export interface BenchWork extends WorkTarget {
  purpose: WorkPurpose;
  partId: number;
  partNumber: string;
  label: string;
  /** The scale the sample was weighed on. */
  scaleId: number;
  /** The scale the count is read on, when the work moved on from the sample's scale (a bigger one). */
  bulkScaleId: number | null;
  step: BenchStep;
  /** Tare taken off the gross for the count, grams. */
  tare: number | null;
  containerId: number | null;
  /** Bin counts: the empty-pan reading the sample was weighed against. */
  panZero: number | null;
  sample: BenchSample | null;
  /** The sample was kept from an earlier count and is not on the pan: it is not part of this count. */
  sampleApart: boolean;
  /** Stable readings while building the sample piece by piece (first: the tared pan). */
  pieceReadings: number[];
  targetQuantity: number | null;
  tolerance: ToleranceBand | null;
  /** Made once per capture and reused on retries (Idempotency-Key). */
  captureKey: string | null;
}

export function startWork(
  input: Pick<BenchWork, 'purpose' | 'partId' | 'partNumber' | 'label' | 'scaleId'> & Partial<Pick<BenchWork, 'targetQuantity' | 'tolerance'> & WorkTarget>,
): BenchWork {
  return {
    ...input,
    orderLineId: input.orderLineId ?? null,
    binId: input.binId ?? null,
    binVersion: input.binVersion ?? null,
    bulkScaleId: null,
    step: 'tare',
    tare: null,
    containerId: null,
    panZero: null,
    sample: null,
    sampleApart: false,
    pieceReadings: [],
    targetQuantity: input.targetQuantity ?? null,
    tolerance: input.tolerance ?? null,
    captureKey: null,
  };
}

/**
 * Part counts: the container's tare (taken now or preset). Bin counts: the empty pan's zero.
 * After a move to another scale the sample is already known, so the count follows the tare.
 */
export function applyTare(work: BenchWork, tare: number, containerId: number | null): BenchWork {
  if (work.sample && (work.bulkScaleId !== null || work.sampleApart)) {
    return work.purpose === 'bin' ? { ...work, step: 'count', panZero: tare, tare, containerId: null } : { ...work, step: 'count', tare, containerId };
  }
  if (work.purpose === 'bin') return { ...work, step: 'sample', panZero: tare, tare: null, containerId: null, pieceReadings: [tare] };
  return { ...work, step: 'sample', tare, containerId, pieceReadings: [tare] };
}

function sampleBase(work: BenchWork): number {
  return (work.purpose === 'bin' ? work.panZero : work.tare) ?? 0;
}

/** A counted sample on the pan, weighed as one stable mean. */
export function takeSample(work: BenchWork, quantity: number, stableGross: number): BenchWork {
  const sample = { quantity, netWeight: stableGross - sampleBase(work) };
  // A bin starts with no container tare; choosing the bin's container adds it.
  if (work.purpose === 'bin') return { ...work, sample, step: 'count', tare: work.panZero };
  return { ...work, sample, step: 'grow' };
}

/** One more piece put on while building the sample piece by piece. */
export function addPieceReading(work: BenchWork, stableGross: number): BenchWork {
  return { ...work, pieceReadings: [...work.pieceReadings, stableGross] };
}

/** Each stable step is one piece's weight. */
export function pieceIncrements(work: BenchWork): number[] {
  const r = work.pieceReadings;
  return r.slice(1).map((v, i) => v - r[i]);
}

/** Close a piece-by-piece sample: n is the number of increments. */
export function finishPieceSample(work: BenchWork): BenchWork {
  const last = work.pieceReadings[work.pieceReadings.length - 1];
  return takeSample(work, work.pieceReadings.length - 1, last);
}

export function growSample(work: BenchWork, sample: BenchSample): BenchWork {
  return { ...work, sample };
}

export function goToCount(work: BenchWork): BenchWork {
  return { ...work, step: 'count' };
}

/**
 * The count moves to another scale of the bench (a bigger one for the bulk), keeping the sample
 * learned on the first: the new scale is tared, then the count is read on it.
 */
export function moveToScale(work: BenchWork, scaleId: number): BenchWork {
  return { ...work, bulkScaleId: scaleId === work.scaleId ? null : scaleId, step: 'tare', tare: null, containerId: null, pieceReadings: [], captureKey: null };
}

/** A sample kept on this tablet when a count was stopped, for the next count of the part. */
export interface KeptSample {
  partId: number;
  scaleId: number;
  sample: BenchSample;
  keptAt: string;
}

export function keepSample(work: BenchWork, at: Date): KeptSample | null {
  return work.sample && work.purpose !== 'bin' ? { partId: work.partId, scaleId: work.scaleId, sample: work.sample, keptAt: at.toISOString() } : null;
}

/**
 * A new count of the part starts from a kept sample: its pieces are off the pan, so the count is
 * of what goes on now, weighed apart from the sample (on the sample's scale or another).
 */
export function startFromKept(work: BenchWork, kept: KeptSample, onScaleId: number): BenchWork {
  return { ...work, sample: kept.sample, sampleApart: true, scaleId: kept.scaleId, bulkScaleId: onScaleId === kept.scaleId ? null : onScaleId };
}

/**
 * Whether the count is of the sample weighed again with the rest, on the same scale. A kept sample
 * is off the pan. On a second scale the sample's pieces go into the bulk, but the two weighings are
 * independent, so the count is made as if the sample were apart: that leaves out the sample pieces'
 * share in both weighings, which would make the count surer, so it errs on the cautious side
 * (var(N̂)/N² ≈ c²(1/n + 1/N) taken instead of c²(1/n − 1/N); docs/counting-model.md).
 */
export function sampleOnPan(work: BenchWork): boolean {
  return !work.sampleApart && work.bulkScaleId === null && sampleStaysOnPan(work.purpose);
}

/** The scale the pan readings come from now. */
export function readingScaleId(work: BenchWork): number {
  return work.bulkScaleId ?? work.scaleId;
}

/** Bin counts: the bin goes on in its container; its preset tare comes off the gross. */
export function chooseBinContainer(work: BenchWork, containerId: number | null, containerTare: number): BenchWork {
  return { ...work, containerId, tare: (work.panZero ?? 0) + containerTare };
}

export function withCaptureKey(work: BenchWork, makeKey: () => string): BenchWork {
  return work.captureKey ? work : { ...work, captureKey: makeKey() };
}

export function markCaptured(work: BenchWork): BenchWork {
  return { ...work, step: 'captured' };
}

/** The next count of the same part, on the scale in use now: a new tare, sample and key. */
export function nextCount(work: BenchWork): BenchWork {
  return { ...startWork({ ...work, scaleId: readingScaleId(work) }), targetQuantity: work.targetQuantity, tolerance: work.tolerance };
}

/** Net weight being counted: on the pan it includes the sample. */
export function countNet(work: BenchWork, gross: number): number {
  return gross - (work.tare ?? sampleBase(work));
}

const STEPS: readonly BenchStep[] = ['tare', 'sample', 'grow', 'count', 'captured'];
const PURPOSES: readonly WorkPurpose[] = ['part', 'bin', 'kit_line'];
const num = (x: unknown): x is number => typeof x === 'number' && Number.isFinite(x);
const numOrNull = (x: unknown): boolean => x === null || num(x);

/** Saved JSON → kept sample, or null when it is not one. */
export function parseKeptSample(text: string | null): KeptSample | null {
  try {
    const k = JSON.parse(text ?? 'null') as Partial<KeptSample> | null;
    return k &&
      num(k.partId) &&
      num(k.scaleId) &&
      typeof k.keptAt === 'string' &&
      num(k.sample?.quantity) &&
      num(k.sample?.netWeight) &&
      k.sample.quantity >= 1 &&
      k.sample.netWeight > 0
      ? (k as KeptSample)
      : null;
  } catch {
    return null;
  }
}

/** Saved JSON → work, or null when it is not a count we could resume. */
export function parseSavedWork(text: string | null): BenchWork | null {
  if (!text) return null;
  let w: Partial<BenchWork>;
  try {
    w = JSON.parse(text) as Partial<BenchWork>;
  } catch {
    return null;
  }
  if (!w || typeof w !== 'object') return null;
  // Work saved before counts could move between scales, or start from a kept sample, has neither.
  w = { bulkScaleId: null, sampleApart: false, ...w };
  const ok =
    PURPOSES.includes(w.purpose as WorkPurpose) &&
    STEPS.includes(w.step as BenchStep) &&
    num(w.partId) &&
    num(w.scaleId) &&
    typeof w.partNumber === 'string' &&
    typeof w.label === 'string' &&
    numOrNull(w.tare) &&
    numOrNull(w.panZero) &&
    numOrNull(w.containerId) &&
    numOrNull(w.targetQuantity) &&
    numOrNull(w.orderLineId) &&
    numOrNull(w.binId) &&
    numOrNull(w.binVersion) &&
    numOrNull(w.bulkScaleId) &&
    typeof w.sampleApart === 'boolean' &&
    (w.sample === null || (num(w.sample?.quantity) && num(w.sample?.netWeight))) &&
    Array.isArray(w.pieceReadings) &&
    w.pieceReadings.every(num) &&
    (w.captureKey === null || typeof w.captureKey === 'string') &&
    (w.tolerance === null || (num(w.tolerance?.below) && num(w.tolerance?.above)));
  return ok ? (w as BenchWork) : null;
}
