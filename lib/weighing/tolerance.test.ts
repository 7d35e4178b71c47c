import { describe, expect, it } from 'vitest';
import { judgeKitLine, type ToleranceWindow } from './tolerance';

// A fastener line, −0/+2 around 100 (a common window for fasteners; common practice).
const window: ToleranceWindow = { target: 100, below: 0, above: 2 };

describe('judgeKitLine', () => {
  it('passes an exact count on the target edge', () => {
    expect(judgeKitLine({ count: 100, expandedUncertainty: 0.4 }, window)).toBe('in');
  });

  it('passes a count whose whole interval fits in the window', () => {
    expect(judgeKitLine({ count: 101, expandedUncertainty: 1.2 }, window)).toBe('in');
  });

  it('marks a count inside the window but with an interval past an edge as uncertain', () => {
    expect(judgeKitLine({ count: 100, expandedUncertainty: 0.5 }, window)).toBe('uncertain');
    expect(judgeKitLine({ count: 101, expandedUncertainty: 1.6 }, window)).toBe('uncertain');
  });

  it('fails a count outside the window whatever its uncertainty', () => {
    expect(judgeKitLine({ count: 99, expandedUncertainty: 0.1 }, window)).toBe('out');
    expect(judgeKitLine({ count: 103, expandedUncertainty: 5 }, window)).toBe('out');
  });

  it('treats a zero-width window as exact-or-nothing', () => {
    const strict = { target: 50, below: 0, above: 0 };
    expect(judgeKitLine({ count: 50, expandedUncertainty: 0.49 }, strict)).toBe('in');
    expect(judgeKitLine({ count: 50, expandedUncertainty: 0.51 }, strict)).toBe('uncertain');
  });
});
