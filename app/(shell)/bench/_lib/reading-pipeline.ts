/**
 * The bench's per-reading work, the same in the page and in the benchmark: stability window,
 * live estimate and trace append. No allocation beyond the frame it returns; the estimate is
 * recomputed only when what it depends on changes.
 */
import { estimateCount, StabilityDetector, type EstimateCountResult, type SpreadBelief } from '@/lib/weighing';
import type { Reading } from '@/lib/scale/reading';
import { assessLoad, type LoadAssessment } from './load-cautions';
import type { TraceBuffer } from './trace-buffer';

export interface PipelineScale {
  division: number;
  repeatability: number;
  capacity: number;
  minLoad: number;
}

export interface PipelineWork {
  tare: number;
  sample: { quantity: number; netWeight: number } | null;
  sampleOnPan: boolean;
  targetQuantity: number | null;
  /** The part's learned spread; null until learned (the site's cautious value is then used). */
  spread: SpreadBelief | null;
  containerWeight: number | null;
}

export interface LiveFrame {
  t: number;
  gross: number;
  stable: boolean;
  /** Mean of the stability window: what a capture uses. */
  mean: number;
  /** Net of what is shown: the window mean once stable, else the latest reading. */
  net: number;
  estimate: EstimateCountResult | null;
  load: LoadAssessment;
}

export interface ReadingPipeline {
  push(reading: Reading, work: PipelineWork): LiveFrame;
  /** Forget the stability history (after a tare or a reconnect). */
  reset(): void;
}

function spreadKey(b: SpreadBelief | null): string {
  if (!b) return '-';
  return b.kind === 'learned' ? `${b.scatter}/${b.noise}/${b.degreesOfFreedom}` : `${b.kind}/${b.pieceSpread}`;
}

export function createReadingPipeline(scale: PipelineScale, options: { windowMs: number; defaultPieceSpread: number; trace: TraceBuffer }): ReadingPipeline {
  const detector = new StabilityDetector({ division: scale.division, repeatability: scale.repeatability, windowMs: options.windowMs });
  let lastKey = '';
  let lastEstimate: EstimateCountResult | null = null;

  const estimate = (net: number, work: PipelineWork): EstimateCountResult | null => {
    const s = work.sample;
    if (!s || s.quantity < 1 || s.netWeight <= 0) return null;
    const netWeight = Math.max(0, net);
    // Readings repeat the same value most of the time: reuse the last answer then.
    const key = `${netWeight}|${s.quantity}|${s.netWeight}|${work.sampleOnPan}|${work.targetQuantity}|${spreadKey(work.spread)}|${work.containerWeight}`;
    if (key === lastKey) return lastEstimate;
    lastKey = key;
    lastEstimate = estimateCount(
      {
        unit: 'g',
        scale: { division: scale.division, repeatability: scale.repeatability, max: scale.capacity, min: scale.minLoad },
        sample: s,
        netWeight,
        sampleOnPan: work.sampleOnPan,
        targetQuantity: work.targetQuantity ?? undefined,
        tare: work.tare > 0 ? work.tare : undefined,
      },
      { defaultPieceSpread: options.defaultPieceSpread, spread: work.spread },
    );
    return lastEstimate;
  };

  return {
    push(reading, work) {
      const state = detector.push(reading);
      options.trace.append(reading.t, reading.gross);
      const shown = state.stable ? state.mean : reading.gross;
      const net = shown - work.tare;
      return {
        t: reading.t,
        gross: reading.gross,
        stable: state.stable,
        mean: state.mean,
        net,
        estimate: estimate(net, work),
        load: assessLoad({ gross: reading.gross, capacity: scale.capacity, containerWeight: work.containerWeight }),
      };
    },
    reset() {
      detector.reset();
    },
  };
}
