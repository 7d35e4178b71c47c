import { describe, expect, it } from 'vitest';
import {
  addPieceReading,
  applyTare,
  chooseBinContainer,
  countNet,
  finishPieceSample,
  nextCount,
  parseSavedWork,
  pieceIncrements,
  startWork,
  takeSample,
  withCaptureKey,
} from './bench-work';

const part = { partId: 7, partNumber: 'SC-4', label: 'SC-4 screw', scaleId: 3 };

describe('bench work', () => {
  it('weighs a part count against the container tare and keeps the sample on the pan', () => {
    let w = applyTare(startWork({ ...part, purpose: 'part' }), 152.4, 2);
    w = takeSample(w, 10, 177.4);
    expect(w.step).toBe('grow');
    expect(w.sample).toEqual({ quantity: 10, netWeight: expect.closeTo(25, 9) });
    expect(countNet(w, 402.4)).toBeCloseTo(250, 9);
  });

  it('weighs a bin sample against the empty pan and the bin against its container tare', () => {
    let w = applyTare(startWork({ ...part, purpose: 'bin' }), 0.1, null);
    w = takeSample(w, 20, 50.1);
    expect(w.step).toBe('count');
    w = chooseBinContainer(w, 9, 800);
    expect(countNet(w, 1800.1)).toBeCloseTo(1000, 9);
    expect(w.sample?.netWeight).toBeCloseTo(50, 9);
  });

  it('turns a sample built piece by piece into one increment per piece', () => {
    let w = applyTare(startWork({ ...part, purpose: 'part' }), 100, null);
    for (const r of [102.5, 105.1, 107.5]) w = addPieceReading(w, r);
    expect(pieceIncrements(w).map((x) => Number(x.toFixed(6)))).toEqual([2.5, 2.6, 2.4]);
    w = finishPieceSample(w);
    expect(w.sample).toEqual({ quantity: 3, netWeight: 7.5 });
  });

  it('makes the capture key once and keeps it for retries, and a new one for the next count', () => {
    let n = 0;
    const make = () => `key-${(n += 1)}`;
    let w = withCaptureKey(startWork({ ...part, purpose: 'part' }), make);
    w = withCaptureKey(w, make);
    expect(w.captureKey).toBe('key-1');
    expect(nextCount(w).captureKey).toBeNull();
  });

  it('resumes saved work and refuses anything else', () => {
    const w = takeSample(applyTare(startWork({ ...part, purpose: 'part', targetQuantity: 100, tolerance: { below: 0, above: 2 } }), 10, 5), 10, 35);
    expect(parseSavedWork(JSON.stringify(w))).toEqual(w);
    expect(parseSavedWork('{"step":"count"}')).toBeNull();
    expect(parseSavedWork('not json')).toBeNull();
    expect(parseSavedWork(null)).toBeNull();
  });
});
