/**
 * The count in progress as plain data, and the steps that move it on. Everything needed to
 * resume after a reload lives here, so it is saved as it is after each change.
 */
import type { ToleranceBand, WorkPurpose, WorkTarget } from './work-item';

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
  scaleId: number;
  step: BenchStep;
  /** Tare taken off the gross for the count, grams. */
  tare: number | null;
  containerId: number | null;
  /** Bin counts: the empty-pan reading the sample was weighed against. */
  panZero: number | null;
  sample: BenchSample | null;
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
    step: 'tare',
    tare: null,
    containerId: null,
    panZero: null,
    sample: null,
    pieceReadings: [],
    targetQuantity: input.targetQuantity ?? null,
    tolerance: input.tolerance ?? null,
    captureKey: null,
  };
}

/** Part counts: the container's tare (taken now or preset). Bin counts: the empty pan's zero. */
export function applyTare(work: BenchWork, tare: number, containerId: number | null): BenchWork {
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

/** The next count of the same part on the same scale: keep the sample, new container and key. */
export function nextCount(work: BenchWork): BenchWork {
  return { ...startWork(work), targetQuantity: work.targetQuantity, tolerance: work.tolerance };
}

/** Net weight being counted: on the pan it includes the sample. */
export function countNet(work: BenchWork, gross: number): number {
  return gross - (work.tare ?? sampleBase(work));
}

const STEPS: readonly BenchStep[] = ['tare', 'sample', 'grow', 'count', 'captured'];
const PURPOSES: readonly WorkPurpose[] = ['part', 'bin', 'kit_line'];
const num = (x: unknown): x is number => typeof x === 'number' && Number.isFinite(x);
const numOrNull = (x: unknown): boolean => x === null || num(x);

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
  const ok =
    PURPOSES.includes(w.purpose as WorkPurpose) &&
    STEPS.includes(w.step as BenchStep) &&
    num(w.partId) && num(w.scaleId) &&
    typeof w.partNumber === 'string' && typeof w.label === 'string' &&
    numOrNull(w.tare) && numOrNull(w.panZero) && numOrNull(w.containerId) && numOrNull(w.targetQuantity) &&
    numOrNull(w.orderLineId) && numOrNull(w.binId) && numOrNull(w.binVersion) &&
    (w.sample === null || (num(w.sample?.quantity) && num(w.sample?.netWeight))) &&
    Array.isArray(w.pieceReadings) && w.pieceReadings.every(num) &&
    (w.captureKey === null || typeof w.captureKey === 'string') &&
    (w.tolerance === null || (num(w.tolerance?.below) && num(w.tolerance?.above)));
  return ok ? (w as BenchWork) : null;
}
