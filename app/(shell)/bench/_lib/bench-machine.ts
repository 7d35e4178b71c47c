/**
 * The count at the bench as a state machine: which actions each step allows, and the guarded
 * moves between steps. The keys, the step panel's buttons and the moves all read `allowedActions`,
 * so a step cannot be taken from anywhere it does not belong. Pure: the side effects (the capture
 * request, the offline queue, the trace) belong to the hook that drives it.
 */
import {
  addPieceReading,
  applyTare,
  finishPieceSample,
  goToCount,
  growSample,
  markCaptured,
  moveToScale,
  nextCount,
  readingScaleId,
  startFromKept,
  takeSample,
  withCaptureKey,
  type BenchSample,
  type BenchStep,
  type BenchWork,
  type KeptSample,
} from './bench-work';

export type BenchAction = 'tare' | 'presetTare' | 'sample' | 'piece' | 'finishPieces' | 'grow' | 'count' | 'capture' | 'next';

const BY_STEP: Readonly<Record<BenchStep, readonly BenchAction[]>> = {
  tare: ['tare', 'presetTare'],
  sample: ['sample', 'piece', 'finishPieces'],
  grow: ['grow', 'count'],
  count: ['capture'],
  captured: ['next'],
};

/** What can be done now: nothing without work in progress. */
export function allowedActions(work: BenchWork | null): readonly BenchAction[] {
  return work ? BY_STEP[work.step] : [];
}

export function allows(work: BenchWork | null, action: BenchAction): boolean {
  return allowedActions(work).includes(action);
}

/** A move the operator asked for, with what the scale said when it was asked (the stable mean). */
export type BenchEvent =
  | { action: 'tare'; stableGross: number; containerId: number | null }
  | { action: 'presetTare'; containerId: number; containerTare: number }
  | { action: 'sample'; quantity: number; stableGross: number }
  | { action: 'piece'; stableGross: number; division: number }
  | { action: 'finishPieces' }
  | { action: 'grow'; sample: BenchSample }
  | { action: 'count' }
  /** The capture is about to be sent: it gets its key once, reused on every retry. */
  | { action: 'capture'; makeKey: () => string }
  | { action: 'next' };

export type Move = { ok: true; work: BenchWork } | { ok: false; reason: string };

const refuse = (reason: string): Move => ({ ok: false, reason });
const to = (work: BenchWork): Move => ({ ok: true, work });

const STEP_WORDS: Readonly<Record<BenchStep, string>> = {
  tare: 'taring the container',
  sample: 'weighing the sample',
  grow: 'growing the sample',
  count: 'counting',
  captured: 'done with this count',
};

export function move(work: BenchWork, event: BenchEvent): Move {
  if (!allows(work, event.action)) return refuse(`That step does not belong here: the bench is ${STEP_WORDS[work.step]}.`);
  switch (event.action) {
    case 'tare':
      return to(applyTare(work, event.stableGross, event.containerId));
    case 'presetTare':
      return to(applyTare(work, event.containerTare, event.containerId));
    case 'sample': {
      if (!Number.isInteger(event.quantity) || event.quantity < 1) return refuse('Say how many pieces are in the sample: a whole number, at least 1.');
      const next = takeSample(work, event.quantity, event.stableGross);
      if (!next.sample || next.sample.netWeight <= 0) return refuse('Nothing is on the pan yet: put the sample on, then press again.');
      return to(next);
    }
    case 'piece': {
      const last = work.pieceReadings[work.pieceReadings.length - 1] ?? work.tare ?? 0;
      if (event.stableGross - last < event.division)
        return refuse('No new piece is on the pan: put exactly one more on, wait for it to settle, and press again.');
      return to(addPieceReading(work, event.stableGross));
    }
    case 'finishPieces':
      if (work.pieceReadings.length < 3) return refuse('Put at least two pieces on one at a time first.');
      return to(finishPieceSample(work));
    case 'grow':
      if (!work.sample || event.sample.quantity <= work.sample.quantity) return refuse('No pieces were added since the last step.');
      return to(growSample(work, event.sample));
    case 'count':
      return to(goToCount(work));
    case 'capture':
      return to(withCaptureKey(work, event.makeKey));
    case 'next':
      return to(nextCount(work));
  }
}

/** Once the sample is learned, the count may move to another scale of the bench and keep it. */
export function canMoveScale(work: BenchWork | null): boolean {
  return work !== null && work.sample !== null && (work.step === 'grow' || work.step === 'count' || (work.step === 'tare' && work.bulkScaleId !== null));
}

export function moveScale(work: BenchWork, scaleId: number): Move {
  if (!canMoveScale(work))
    return refuse(
      work.sample
        ? 'The scale can change once the sample is weighed, until the count is captured.'
        : 'Weigh the sample first: the scale can change once its piece weight is known.',
    );
  if (scaleId === readingScaleId(work)) return refuse('The count is on that scale already.');
  return to(moveToScale(work, scaleId));
}

/** A kept sample serves a new count of the same part, before anything is weighed for it. */
export function canUseKept(work: BenchWork | null, kept: KeptSample | null): kept is KeptSample {
  return work !== null && kept !== null && kept.partId === work.partId && work.purpose !== 'bin' && work.step === 'tare' && work.sample === null;
}

export function takeKept(work: BenchWork, kept: KeptSample | null, onScaleId: number): Move {
  if (!canUseKept(work, kept)) return refuse('There is no kept sample of this part to use now.');
  return to(startFromKept(work, kept, onScaleId));
}

/** The server recorded the capture, or it waits in the offline queue: the count is done either way. */
export function captureDone(work: BenchWork): BenchWork {
  return work.step === 'count' ? markCaptured(work) : work;
}
