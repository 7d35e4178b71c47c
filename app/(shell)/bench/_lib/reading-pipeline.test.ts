import { describe, expect, it } from 'vitest';
import { createReadingPipeline, type PipelineWork } from './reading-pipeline';
import { TraceBuffer } from './trace-buffer';

const scale = { division: 0.1, repeatability: 0, capacity: 6000, minLoad: 20 };
const work: PipelineWork = {
  tare: 100,
  sample: { quantity: 10, netWeight: 25 },
  sampleOnPan: true,
  targetQuantity: null,
  spread: { kind: 'known', pieceSpread: 0.01 },
  containerWeight: 100,
};

function run(values: number[], w: PipelineWork = work) {
  const trace = new TraceBuffer(100);
  const pipeline = createReadingPipeline(scale, { windowMs: 200, defaultPieceSpread: 0.05, trace });
  const frames = values.map((gross, i) => pipeline.push({ t: i * 50, gross, unit: 'g' }, w));
  return { frames, trace };
}

describe('reading pipeline', () => {
  it('counts the net of the stable window mean and keeps every reading in the trace', () => {
    const { frames, trace } = run([100, 150, 150, 150, 150, 150, 150]);
    const last = frames[frames.length - 1];
    expect(last.stable).toBe(true);
    expect(last.net).toBeCloseTo(50, 9);
    expect(last.estimate?.count).toBe(20);
    expect(trace.size()).toBe(7);
  });

  it('shows the latest reading while the pan is still moving', () => {
    const { frames } = run([100, 120, 140]);
    expect(frames[2].stable).toBe(false);
    expect(frames[2].net).toBeCloseTo(40, 9);
  });

  it('has no estimate before a sample is taken', () => {
    const { frames } = run([100, 100], { ...work, sample: null });
    expect(frames[1].estimate).toBeNull();
  });

  it('flags a load near the capacity', () => {
    const { frames } = run([5500]);
    expect(frames[0].load.level).toBe('near');
  });
});
