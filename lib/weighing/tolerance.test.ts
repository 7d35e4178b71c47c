import { describe, expect, it } from 'vitest';
import { judgeKitLine, toWholePieces, type ToleranceWindow } from './tolerance';

// A fastener line, −0/+2 around 100 (a common window for fasteners; common practice).
const window: ToleranceWindow = { target: 100, below: 0, above: 2 };

describe('judgeKitLine', () => {
  it('passes an exact count on the target edge', () => {
    expect(judgeKitLine({ count: 100, wholePieceRange: 0 }, window)).toBe('in');
  });

  it('passes a count whose whole range fits in the window', () => {
    expect(judgeKitLine({ count: 101, wholePieceRange: 1 }, window)).toBe('in');
  });

  it('marks a count inside the window but with a range past an edge as uncertain', () => {
    expect(judgeKitLine({ count: 100, wholePieceRange: 1 }, window)).toBe('uncertain');
    expect(judgeKitLine({ count: 101, wholePieceRange: 2 }, window)).toBe('uncertain');
  });

  it('fails a count outside the window whatever its range', () => {
    expect(judgeKitLine({ count: 99, wholePieceRange: 0 }, window)).toBe('out');
    expect(judgeKitLine({ count: 103, wholePieceRange: 5 }, window)).toBe('out');
  });

  it('treats a zero-width window as exact-or-nothing', () => {
    const strict = { target: 50, below: 0, above: 0 };
    expect(judgeKitLine({ count: 50, wholePieceRange: 0 }, strict)).toBe('in');
    expect(judgeKitLine({ count: 50, wholePieceRange: 1 }, strict)).toBe('uncertain');
  });
});

describe('toWholePieces', () => {
  it('rounds U half up and never gives 0 for a count that was not exact', () => {
    expect(toWholePieces(0.3)).toBe(1);
    expect(toWholePieces(1.49)).toBe(1);
    expect(toWholePieces(1.5)).toBe(2);
    expect(toWholePieces(129.2)).toBe(129);
  });
});
