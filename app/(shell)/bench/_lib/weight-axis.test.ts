import { describe, expect, it } from 'vitest';
import { weightAxis } from './weight-axis';

describe('weightAxis', () => {
  it('spans at least ten divisions around a still reading, and the whole trace when it moves more', () => {
    const axis = weightAxis(0.001);
    const [lo, hi] = axis.range(0, 0.001);
    expect(hi - lo).toBeCloseTo(0.01, 12);
    expect((lo + hi) / 2).toBeCloseTo(0.0005, 12);
    const [a, b] = axis.range(100, 250);
    expect(a).toBeLessThan(100);
    expect(b).toBeGreaterThan(250);
    expect(axis.range(NaN, NaN)).toEqual([-0.005, 0.005]);
  });

  it('puts ticks on whole divisions, so labels at the division decimals never repeat', () => {
    for (const d of [0.001, 0.002, 0.005, 0.01, 0.1, 0.5, 1, 2, 5, 20]) {
      const axis = weightAxis(d);
      for (const step of axis.incrs) {
        expect(Math.abs(step / d - Math.round(step / d))).toBeLessThan(1e-9);
        const labels = Array.from({ length: 12 }, (_, i) => axis.format(i * step - 5 * step));
        expect(new Set(labels).size, `d = ${d}, step ${step}`).toBe(labels.length);
      }
    }
    expect(weightAxis(0.001).format(0.002)).toBe('0.002');
    expect(weightAxis(5).format(120)).toBe('120');
  });
});
