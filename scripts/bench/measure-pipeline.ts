/**
 * Per-reading cost of the bench page's pipeline (stability window + live estimate + trace append)
 * over one simulated hour at 50 Hz, with the pan changing as it does during kitting.
 * A reading is counted as dropped when its processing takes longer than one reading period:
 * a single-threaded page would then fall behind the scale.
 */
import { SimulatedScale } from '../../lib/scale/simulator';
import { createReadingPipeline, type PipelineWork } from '../../app/(shell)/bench/_lib/reading-pipeline';
import { TraceBuffer } from '../../app/(shell)/bench/_lib/trace-buffer';

export interface PipelineFigures {
  rateHz: number;
  readings: number;
  periodUs: number;
  meanUs: number;
  p50Us: number;
  p99Us: number;
  p999Us: number;
  maxUs: number;
  dropped: number;
  traceKept: number;
  cpuShareOfRealTime: number;
}

function percentile(sorted: Float64Array, p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))];
}

export function measurePipeline(rateHz = 50, seconds = 3600): PipelineFigures {
  const scale = new SimulatedScale({
    seed: 2024,
    capacity: 6000,
    division: 0.1,
    repeatability: 0.02,
    settleMs: 250,
    rateHz,
    part: { meanWeight: 2.5, spread: 0.01 },
  });
  const trace = new TraceBuffer(rateHz * 3600);
  const pipeline = createReadingPipeline(
    { division: 0.1, repeatability: 0.02, capacity: 6000, minLoad: 20 },
    { windowMs: 1000, defaultPieceSpread: 0.05, trace },
  );
  const work: PipelineWork = {
    tare: 150,
    sample: { quantity: 30, netWeight: 75 },
    sampleOnPan: true,
    targetQuantity: 500,
    spread: { kind: 'learned', scatter: 0.0001, noise: 0.000002, degreesOfFreedom: 24, observations: 25 },
    containerWeight: 150,
  };
  const n = rateHz * seconds;
  const costs = new Float64Array(n);
  const periodMs = 1000 / rateHz;
  const periodUs = 1e6 / rateHz;
  scale.placeContainer(150);
  let dropped = 0;
  for (let i = 0; i < n; i += 1) {
    // A kit line every 40 s: pieces go on in handfuls, then the bag comes off and a new one goes on.
    const second = (i / rateHz) % 40;
    if (i % rateHz === 0 && second < 30 && second % 3 === 0) scale.addPieces(15);
    if (i % (rateHz * 40) === rateHz * 39) {
      scale.clearPan();
      scale.placeContainer(150);
    }
    const [reading] = scale.tick(periodMs);
    const start = process.hrtime.bigint();
    pipeline.push(reading, work);
    const us = Number(process.hrtime.bigint() - start) / 1000;
    costs[i] = us;
    if (us > periodUs) dropped += 1;
  }
  const total = costs.reduce((a, b) => a + b, 0);
  const sorted = costs.slice().sort();
  return {
    rateHz,
    readings: n,
    periodUs,
    meanUs: total / n,
    p50Us: percentile(sorted, 0.5),
    p99Us: percentile(sorted, 0.99),
    p999Us: percentile(sorted, 0.999),
    maxUs: sorted[n - 1],
    dropped,
    traceKept: trace.size(),
    cpuShareOfRealTime: total / 1e6 / seconds,
  };
}
