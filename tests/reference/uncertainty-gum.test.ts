/**
 * The uncertainty building blocks against JCGM 100:2008 (GUM) and NIST TN 1297 (1994),
 * each checked both by value and by simulating the situation the clause describes.
 */
import { describe, expect, it } from 'vitest';
import { createRandom } from '../../lib/scale/prng';
import { countVariance } from '../../lib/weighing/count-variance';
import { roundToStep } from '../../lib/weighing/round';
import { indicationVariance, netWeightUncertainty, rectangularUncertainty, resolutionUncertainty } from '../../lib/weighing/uncertainty';

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

  // docs/references.md (GUM F.2.2.1): a net reading from two rounded indications has u = d/√6 ≈ 0.41 d.
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

  // GUM 5.1.2 over the independent inputs — three indications I_0, I_s, I_b (each d²/12 + s_r²)
  // and the piece sums — must equal countVariance, which states the same thing with correlated
  // net weights (GUM 5.2.2). Sensitivities by central differences, so this check does not share the
  // algebra it is checking. s_r = d/2 makes rounding errors independent (their dependence on a
  // quiet scale is checked in rounding-covariance.test.ts), so the two agree to about 1e-5.
  it('equals the law of propagation over the separate indications, with a shared or own zero', () => {
    const d = 0.1;
    const sr = 0.05;
    const apw = 0.6;
    const noise = indicationVariance({ division: d, repeatability: sr });
    for (const { n, change, onPan, c } of [
      { n: 25, change: 25, onPan: true, c: 0.01 },
      { n: 10, change: 40, onPan: true, c: 0.01 },
      { n: 50, change: -20, onPan: true, c: 0.01 },
      { n: 25, change: 60, onPan: false, c: 0.01 },
    ]) {
      // x = [I_0, I_s, J_0, I_b, K, A]: J_0 is the bulk's own zero (apart only). Pieces added: K the
      // sample's n pieces, A the M added. Taken off: K the n − M that stay, A the M taken off
      // (they were part of the sample). Apart: K the sample, A the N fresh pieces.
      const takenOff = change < 0;
      const m = Math.abs(change);
      const count = (x: number[]): number => {
        const [i0, is, j0, ib, k, a] = x;
        const sampleNet = (takenOff ? k + a : k) + is - i0;
        const load = onPan ? (takenOff ? k : k + a) + ib - i0 : a + ib - j0;
        return (n * load) / sampleNet;
      };
      const kept = takenOff ? n - m : n;
      const nominal = [0, 0, 0, 0, kept * apw, m * apw];
      const variances = [noise, noise, onPan ? 0 : noise, noise, kept * (c * apw) ** 2, m * (c * apw) ** 2];
      let gum = 0;
      nominal.forEach((_, i) => {
        const h = 1e-6;
        const up = nominal.map((v, j) => (j === i ? v + h : v));
        const down = nominal.map((v, j) => (j === i ? v - h : v));
        gum += ((count(up) - count(down)) / (2 * h)) ** 2 * variances[i];
      });
      const trueCount = onPan ? n + change : change;
      const model = countVariance(
        { sampleQuantity: n, averagePieceWeight: apw, sampleScale: { division: d, repeatability: sr }, sampleOnPan: onPan },
        trueCount,
        c * c,
      );
      expect(model / gum, `n=${n} change=${change} onPan=${onPan}`).toBeCloseTo(1, 4);
    }
  });
});
