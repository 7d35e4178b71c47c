/**
 * The dependent rounding of a quiet scale (lib/weighing/rounding-covariance.ts) against direct
 * numerical averaging. GUM (JCGM 100:2008) F.2.2.1 gives d²/12 for one rounding error; the
 * covariance of two readings' rounding errors follows from averaging their product over the
 * unknown zero position, which this file does by brute force on a grid, sharing no formula with
 * the product (its saw-tooth Fourier series and closed forms are what is being checked).
 */
import { describe, expect, it } from 'vitest';
import { largestRoundingCovariance, mostNegativeRoundingCovariance, netVarianceBound } from '../../lib/weighing/rounding-covariance';

const d = 0.01;

/** Rounding error of one reading of a true load x: round(x/d)·d − x. */
const roundingError = (x: number): number => Math.round(x / d) * d - x;

/** E over the reading noise η ~ N(0, s²) of the rounding error at x, on a fine grid of η. */
function blurredError(x: number, s: number): number {
  if (s === 0) return roundingError(x);
  let sum = 0;
  let weights = 0;
  for (let i = -240; i <= 240; i += 1) {
    const eta = (i / 40) * s;
    const w = Math.exp(-0.5 * (i / 40) ** 2);
    sum += w * roundingError(x + eta);
    weights += w;
  }
  return sum / weights;
}

/** Cov of the errors of two readings Δ apart, averaged over the zero position and a Δ uncertain by σ. */
function bruteCovariance(delta: number, s: number, sigma: number): number {
  const zs = 800;
  const deltas = sigma === 0 ? [[delta, 1]] : Array.from({ length: 121 }, (_, i) => [delta + ((i - 60) / 20) * sigma, Math.exp(-0.5 * ((i - 60) / 20) ** 2)]);
  const total = deltas.reduce((sum, [, w]) => sum + w, 0);
  let cov = 0;
  for (const [dl, w] of deltas) {
    let inner = 0;
    for (let j = 0; j < zs; j += 1) {
      const z = ((j + 0.5) / zs) * d;
      inner += blurredError(z + dl, s) * blurredError(z, s);
    }
    cov += (w / total) * (inner / zs);
  }
  return cov;
}

describe('rounding errors of two readings on one scale', () => {
  it('are at most +d²/12 and at least −d²/24 apart on a perfectly quiet scale', () => {
    expect(largestRoundingCovariance({ division: d, repeatability: 0 }, 0)).toBeCloseTo((d * d) / 12, 12);
    expect(mostNegativeRoundingCovariance({ division: d, repeatability: 0 }, 0)).toBeCloseTo((d * d) / 24, 12);
    expect(bruteCovariance(0.5 * d, 0, 0) / (d * d)).toBeCloseTo(-1 / 24, 5);
    // a net half a division off the grid reads 0 or d around its mean: variance d²/4
    expect(netVarianceBound({ division: d, repeatability: 0 }, 0)).toBeCloseTo((d * d) / 4, 12);
  });

  it('match the brute-force average for reading noise and an uncertain load', () => {
    for (const [s, sigma] of [
      [0, 0.05 * d],
      [0, 0.2 * d],
      [0.1 * d, 0],
      [0.25 * d, 0],
      [0.1 * d, 0.1 * d],
    ]) {
      const noise = { division: d, repeatability: s };
      const most = largestRoundingCovariance(noise, sigma);
      const least = -mostNegativeRoundingCovariance(noise, sigma);
      const bruteMost = bruteCovariance(3 * d, s, sigma);
      const bruteLeast = bruteCovariance(3.5 * d, s, sigma);
      // never below the true value (they feed a variance bound), and close to it
      expect(most, `s=${s} σ=${sigma}`).toBeGreaterThanOrEqual(bruteMost - 2e-4 * d * d);
      expect(most - bruteMost, `s=${s} σ=${sigma}`).toBeLessThan(2e-3 * d * d);
      expect(-least, `s=${s} σ=${sigma}`).toBeGreaterThanOrEqual(-bruteLeast - 2e-4 * d * d);
      expect(bruteLeast - least, `s=${s} σ=${sigma}`).toBeLessThan(2e-3 * d * d);
    }
  });

  it('stop mattering once the noise is half a division (the usual assumption of independence holds)', () => {
    const noise = { division: d, repeatability: 0.5 * d };
    expect(largestRoundingCovariance(noise, 0)).toBeLessThan(1e-5 * d * d);
    expect(netVarianceBound(noise, 0) / (2 * ((d * d) / 12 + 0.25 * d * d))).toBeCloseTo(1, 4);
  });
});
