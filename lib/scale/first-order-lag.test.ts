import { describe, expect, it } from 'vitest';
import { FirstOrderLag } from './first-order-lag';

describe('FirstOrderLag', () => {
  it('covers 1 − 1/e of a step after one time constant and nearly all after five', () => {
    const lag = new FirstOrderLag(100);
    lag.setTarget(0, 50);
    expect(lag.valueAt(100)).toBeCloseTo(50 * (1 - Math.exp(-1)), 9);
    expect(lag.remainingAt(500)).toBeCloseTo(50 * Math.exp(-5), 9);
  });

  it('starts a new step from where the value is, not from the old target', () => {
    const lag = new FirstOrderLag(100);
    lag.setTarget(0, 100);
    const midway = lag.valueAt(100);
    lag.setTarget(100, 0);
    expect(lag.valueAt(100)).toBeCloseTo(midway, 12);
    expect(lag.valueAt(200)).toBeCloseTo(midway * Math.exp(-1), 9);
  });
});
