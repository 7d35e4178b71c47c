/**
 * The uncertainty building blocks against JCGM 100:2008 (GUM) and NIST TN 1297 (1994),
 * each checked both by value and by simulating the situation the clause describes.
 */
import { describe, expect, it } from 'vitest';
import { createRandom } from '../../lib/scale/prng';
import { roundToStep } from '../../lib/weighing/round';
import { netWeightUncertainty, rectangularUncertainty, resolutionUncertainty } from '../../lib/weighing/uncertainty';

const random = createRandom(20080901);

function sd(xs: number[]): number {
  const mean = xs.reduce((a, b) => a + b, 0) / xs.length;
  return Math.sqrt(xs.reduce((a, b) => a + (b - mean) ** 2, 0) / (xs.length - 1));
}

describe('JCGM 100:2008 and NIST TN 1297', () => {
  // GUM F.2.2.1: resolution δx of a digital indication → rectangular on ±δx/2 → u = δx/√12.
  it('matches the scatter of rounding errors of a digital indication (F.2.2.1)', () => {
    const d = 0.1;
    const errors = Array.from({ length: 50000 }, () => {
      const load = random.next() * 100;
      return roundToStep(load, d) - load;
    });
    expect(resolutionUncertainty(d)).toBeCloseTo(0.028868, 6);
    expect(sd(errors) / resolutionUncertainty(d)).toBeCloseTo(1, 1);
  });

  // REFERENCES.md: a net reading from two rounded indications has u = d/√6 ≈ 0.41 d.
  it('matches the scatter of a net weight taken as gross minus a rounded zero', () => {
    const d = 0.01;
    const nets = Array.from({ length: 50000 }, () => {
      const offset = random.next() * d; // where the true zero falls between two divisions
      const load = random.next() * 500;
      return roundToStep(offset + load, d) - roundToStep(offset, d) - load;
    });
    expect(netWeightUncertainty({ division: d }) / d).toBeCloseTo(0.408, 3);
    expect(sd(nets) / netWeightUncertainty({ division: d })).toBeCloseTo(1, 1);
  });

  // GUM 4.3.7: a quantity known only to lie within ±a, equally likely anywhere, has u = a/√3.
  it('matches the scatter of a uniform error within ±a (4.3.7)', () => {
    const a = 0.5;
    const xs = Array.from({ length: 50000 }, () => (random.next() * 2 - 1) * a);
    expect(sd(xs) / rectangularUncertainty(a)).toBeCloseTo(1, 1);
  });

  // TN 1297 §6.2: k = 2 gives an interval of about 95 % for a normal result (95.45 %).
  it('puts about 95 % of normal results within ±2 standard uncertainties (TN 1297 §6.2)', () => {
    const n = 100000;
    const inside = Array.from({ length: n }, () => random.normal()).filter((z) => Math.abs(z) <= 2).length / n;
    expect(inside).toBeGreaterThan(0.951);
    expect(inside).toBeLessThan(0.958);
  });
});
