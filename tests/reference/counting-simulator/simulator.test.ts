/**
 * The simulator's own physics, checked without the product: its random numbers, rounding to the
 * division, piece weights, one-by-one increments, zero offsets per episode and determinism.
 * Statistical checks use fixed seeds and bands of 4–5 standard errors, so they are stable.
 */
import { describe, expect, it } from 'vitest';
import { isResolved, makeRegime, quickGrid, fullGrid, regimeKey, runRegime, judgeRegime, wilsonInterval } from './grid';
import {
  Rng,
  WeighingEpisode,
  ZERO_OFFSET_DIVISIONS,
  decimalsOf,
  divisionsToWeight,
  drawPiece,
  drawPiecesTotal,
  placeOneByOne,
  roundHalfAwayFromZero,
  simulateTrial,
  toDivisions,
  type Regime,
} from './simulator';

function meanSd(xs: number[]): { mean: number; sd: number } {
  const mean = xs.reduce((a, b) => a + b, 0) / xs.length;
  const sd = Math.sqrt(xs.reduce((a, b) => a + (b - mean) ** 2, 0) / (xs.length - 1));
  return { mean, sd };
}

function correlation(xs: number[], ys: number[]): number {
  const a = meanSd(xs);
  const b = meanSd(ys);
  let s = 0;
  for (let i = 0; i < xs.length; i += 1) s += (xs[i] - a.mean) * (ys[i] - b.mean);
  return s / (xs.length - 1) / (a.sd * b.sd);
}

const base: Regime = makeRegime({
  spread: 0.02,
  knowledge: 'known',
  n: 10,
  N: 200,
  d: 0.01,
  apw: 2.7183,
  sr: 'halfDivision',
  geometry: 'onPan',
});

describe('random numbers', () => {
  // Known answers of xoshiro128** from a given state: the test data of github.com/edorfaus/xoshiro-6502
  // (test-rom/testdata.asm), produced there by the authors' C reference implementation.
  it('reproduces published xoshiro128** outputs', () => {
    const rng = new Rng([0x964d4a0c, 0xd40ab895, 0xad7fdecb, 0x3006f0f0]);
    expect(Array.from({ length: 4 }, () => rng.nextUint32())).toEqual([0xf1391922, 0x6fe53806, 0xa5be2840, 0xf510ee70]);
  });

  it('gives uniforms with the moments of U[0, 1) and a flat histogram', () => {
    const rng = new Rng(1);
    const bins = new Array<number>(20).fill(0);
    const xs = Array.from({ length: 200_000 }, () => rng.uniform());
    expect(xs.every((u) => u >= 0 && u < 1)).toBe(true);
    for (const u of xs) bins[Math.floor(u * 20)] += 1;
    const { mean, sd } = meanSd(xs);
    expect(Math.abs(mean - 0.5)).toBeLessThan(5 * Math.sqrt(1 / 12 / xs.length));
    expect(sd).toBeCloseTo(Math.sqrt(1 / 12), 3);
    // Pearson χ² with 19 degrees of freedom: above 50 has probability ~1e-4 (from memory).
    const expected = xs.length / 20;
    const chi2 = bins.reduce((a, k) => a + (k - expected) ** 2 / expected, 0);
    expect(chi2).toBeLessThan(50);
  });

  it('gives standard normals: mean 0, sd 1, 5 % beyond ±1.96', () => {
    const rng = new Rng(2);
    const zs = Array.from({ length: 200_000 }, () => rng.normal());
    const { mean, sd } = meanSd(zs);
    expect(Math.abs(mean)).toBeLessThan(5 / Math.sqrt(zs.length));
    expect(Math.abs(sd - 1)).toBeLessThan(0.01);
    const tail = zs.filter((z) => Math.abs(z) > 1.959964).length / zs.length;
    expect(Math.abs(tail - 0.05)).toBeLessThan(5 * Math.sqrt((0.05 * 0.95) / zs.length));
  });

  it('is deterministic for a seed, and different seeds differ', () => {
    const a = new Rng(12345);
    const b = new Rng(12345);
    const c = new Rng(12346);
    const sa = Array.from({ length: 50 }, () => a.nextUint32());
    expect(Array.from({ length: 50 }, () => b.nextUint32())).toEqual(sa);
    expect(Array.from({ length: 50 }, () => c.nextUint32())).not.toEqual(sa);
    // Seeds beyond 2^32 (base seed × 2^32 + regime hash) still separate.
    expect(new Rng(2 ** 40 + 7).nextUint32()).not.toBe(new Rng(7).nextUint32());
  });
});

describe('rounding to the division', () => {
  it('rounds half away from zero', () => {
    expect([2.5, -2.5, 2.4999, -2.4999, 0.5, -0.5, 0, 7].map(roundHalfAwayFromZero)).toEqual([3, -3, 2, -2, 1, -1, 0, 7]);
  });

  it('indicates whole divisions written as clean decimals', () => {
    expect([0.001, 0.01, 0.1, 1, 0.05, 0.0005].map(decimalsOf)).toEqual([3, 2, 1, 0, 2, 4]);
    expect(toDivisions(0.3499, 0.1)).toBe(3);
    expect(toDivisions(0.3501, 0.1)).toBe(4);
    expect(divisionsToWeight(3, 0.1)).toBe(0.3);
    expect(divisionsToWeight(7, 0.01)).toBe(0.07);
    expect(divisionsToWeight(236_550_123, 0.001)).toBe(236_550.123);
    expect(String(divisionsToWeight(-3, 0.1))).toBe('-0.3');
  });

  it('leaves a reading within half a division of load + offset when s_r = 0', () => {
    const rng = new Rng(3);
    const scale = { division: 0.1, repeatability: 0 };
    const errors: number[] = [];
    for (let i = 0; i < 20_000; i += 1) {
      const episode = new WeighingEpisode(rng, scale);
      const load = 10 * rng.uniform();
      const error = episode.readDivisions(load) * scale.division - (load + episode.zeroOffset);
      expect(Math.abs(error)).toBeLessThanOrEqual(scale.division / 2 + 1e-12);
      errors.push(error);
    }
    // Rectangular over ±d/2: sd = d/√12 (JCGM 100:2008 F.2.2.1).
    expect(meanSd(errors).sd / (0.1 / Math.sqrt(12))).toBeCloseTo(1, 1);
  });

  it('adds noise of sd s_r before rounding', () => {
    const rng = new Rng(4);
    const scale = { division: 0.001, repeatability: 0.05 }; // d ≪ s_r: rounding adds little
    const episode = new WeighingEpisode(rng, scale);
    const readings = Array.from({ length: 20_000 }, () => episode.readDivisions(5) * scale.division);
    expect(meanSd(readings).sd).toBeCloseTo(0.05, 3);
  });
});

describe('piece weights', () => {
  it('have mean μ and sd c·μ', () => {
    const rng = new Rng(5);
    const [apw, c] = [2.7183, 0.05];
    const ws = Array.from({ length: 200_000 }, () => drawPiece(rng, apw, c));
    const { mean, sd } = meanSd(ws);
    expect(Math.abs(mean - apw)).toBeLessThan((5 * c * apw) / Math.sqrt(ws.length));
    expect(Math.abs(sd / (c * apw) - 1)).toBeLessThan(0.01);
    expect(ws.reduce((a, b) => Math.min(a, b))).toBeGreaterThan(0);
  });

  it('never fall below the floor', () => {
    const rng = new Rng(6);
    const ws = Array.from({ length: 20_000 }, () => drawPiece(rng, 1, 0.6));
    expect(ws.reduce((a, b) => Math.min(a, b))).toBeCloseTo(0.01, 12);
  });

  it('sum to m·μ with sd √m·c·μ, drawn as one normal or piece by piece', () => {
    const rng = new Rng(7);
    for (const c of [0.05, 0.2]) {
      // 0.2 takes the piece-by-piece path
      const m = 40;
      const totals = Array.from({ length: 20_000 }, () => drawPiecesTotal(rng, m, 0.3183, c));
      const { mean, sd } = meanSd(totals);
      const sdExpected = Math.sqrt(m) * c * 0.3183;
      expect(Math.abs(mean - m * 0.3183)).toBeLessThan((5 * sdExpected) / Math.sqrt(totals.length));
      expect(Math.abs(sd / sdExpected - 1)).toBeLessThan(0.03);
    }
    expect(drawPiecesTotal(rng, 0, 1, 0.05)).toBe(0);
  });
});

describe('weighing episodes', () => {
  it('puts pieces on one by one: increments sum to the last reading minus the zero reading', () => {
    const rng = new Rng(8);
    for (const d of [0.001, 0.1, 1]) {
      const regime = { ...base, division: d, repeatability: d / 2 };
      const seen = placeOneByOne(rng, regime, 25);
      expect(seen.increments).toHaveLength(25);
      const sum = seen.increments.reduce((a, b) => a + b, 0);
      expect(toDivisions(sum, d)).toBe(seen.readings[24] - seen.zero);
      expect(seen.increments[0]).toBe(divisionsToWeight(seen.readings[0] - seen.zero, d));
    }
    // On a fine scale the increments are the pieces: mean μ, sd ≈ c·μ.
    const fine = { ...base, division: 0.0001, repeatability: 0, spread: 0.05 };
    const increments = Array.from({ length: 400 }, () => placeOneByOne(rng, fine, 25).increments).flat();
    const { mean, sd } = meanSd(increments);
    expect(mean).toBeCloseTo(base.apw, 2);
    expect(sd / (0.05 * base.apw)).toBeCloseTo(1, 1);
  });

  it('draws a fresh zero offset, uniform over [0, 50 d), for every episode', () => {
    const rng = new Rng(9);
    const offsets = Array.from({ length: 20_000 }, () => new WeighingEpisode(rng, base).zeroOffset / base.division);
    expect(new Set(offsets).size).toBe(offsets.length);
    expect(offsets.reduce((a, b) => Math.min(a, b))).toBeGreaterThanOrEqual(0);
    expect(offsets.reduce((a, b) => Math.max(a, b))).toBeLessThan(ZERO_OFFSET_DIVISIONS);
    expect(meanSd(offsets).mean / (ZERO_OFFSET_DIVISIONS / 2)).toBeCloseTo(1, 1);
  });

  /**
   * With c = 0 every net's error is the weighing's alone: e_s = ε_s − ε_0, e_b = ε_b − ε_0, each
   * reading's ε being noise plus rounding. On the pan both nets share the zero reading's ε_0, so
   * their correlation is 1/2; apart, the load has its own episode and zero, so 0. s_r = d makes
   * the readings' errors independent of one another (with s_r = 0 and fixed loads every rounding
   * error would be a function of the one offset).
   */
  it('shares one zero between sample and load on the pan, not apart', () => {
    const d = 0.1;
    const errorsOf = (geometry: 'onPan' | 'apart'): { s: number[]; b: number[] } => {
      const regime = { ...base, spread: 0, repeatability: d, division: d, geometry };
      const rng = new Rng(10);
      const s: number[] = [];
      const b: number[] = [];
      for (let i = 0; i < 20_000; i += 1) {
        const { request } = simulateTrial(rng, regime);
        s.push(request.sample.netWeight - regime.sampleQuantity * regime.apw);
        b.push(request.netWeight - regime.quantity * regime.apw);
      }
      return { s, b };
    };
    const onPan = errorsOf('onPan');
    const apart = errorsOf('apart');
    expect(correlation(onPan.s, onPan.b)).toBeCloseTo(0.5, 1);
    expect(Math.abs(correlation(apart.s, apart.b))).toBeLessThan(0.04);
    // Two readings, each noise s_r plus rounding d/√12 (JCGM 100:2008 F.2.2.1).
    expect(meanSd(onPan.b).sd / Math.sqrt(2 * (d * d + (d * d) / 12))).toBeCloseTo(1, 1);
  });
});

describe('trials', () => {
  it('build the request each knowledge mode calls for', () => {
    const rng = new Rng(11);
    const known = simulateTrial(rng, base);
    expect(known.truth).toBe(200);
    expect(known.request.pieceSpread).toBe(0.02);
    expect(known.request.sample.increments).toBeUndefined();
    expect(known.request.sampleOnPan).toBe(true);
    expect(known.request.scale).toEqual({ division: 0.01, repeatability: 0.005, max: 5436.6, min: 0 });
    expect(known.request.netWeight).toBeGreaterThan(190 * 2.7183);
    const unknown = simulateTrial(rng, { ...base, knowledge: 'unknown', geometry: 'apart' });
    expect(unknown.request.pieceSpread).toBeUndefined();
    expect(unknown.request.sample.increments).toBeUndefined();
    expect(unknown.request.sampleOnPan).toBe(false);
    const learned = simulateTrial(rng, { ...base, knowledge: 'learned10' });
    expect(learned.request.pieceSpread).toBeUndefined();
    expect(learned.request.sample.increments).toHaveLength(10);
    expect(JSON.parse(JSON.stringify(learned.request))).toEqual(learned.request); // plain JSON
  });

  it('repeat exactly for a seed', () => {
    const run = (seed: number) => {
      const rng = new Rng(seed);
      return Array.from({ length: 20 }, () => simulateTrial(rng, { ...base, knowledge: 'learned5', geometry: 'apart' }));
    };
    expect(run(99)).toEqual(run(99));
    expect(run(99)).not.toEqual(run(100));
  });

  it('mark a sample that reads 0 or less as unsendable', () => {
    const rng = new Rng(12);
    const tiny = makeRegime({ spread: 0.02, knowledge: 'known', n: 5, N: 50, d: 1, apw: 0.0537, sr: 'zero', geometry: 'onPan' });
    const trials = Array.from({ length: 500 }, () => simulateTrial(rng, tiny));
    const unsendable = trials.filter((t) => t.unsendable !== null);
    expect(unsendable.length).toBeGreaterThan(0);
    for (const t of unsendable) expect(t.request.sample.netWeight).toBeLessThanOrEqual(0);
    for (const t of trials.filter((x) => x.unsendable === null)) expect(t.request.sample.netWeight).toBeGreaterThan(0);
  });
});

describe('grid and judgement', () => {
  it('has the briefed sizes and keeps the hard cases in the quick grid', () => {
    expect(fullGrid()).toHaveLength(24_000);
    const quick = quickGrid();
    expect(new Set(quick.map(regimeKey)).size).toBe(quick.length);
    const hard = (r: Regime) => r.spread === 0.05 && r.sampleQuantity === 5 && r.repeatability === 0;
    expect(quick.some((r) => hard(r) && r.knowledge === 'unknown' && r.apw >= r.division && r.apw < 2 * r.division)).toBe(true);
    expect(quick.some((r) => hard(r) && r.knowledge === 'learned5' && r.apw >= r.division && r.apw < 2 * r.division)).toBe(true);
    expect(quick.some((r) => !isResolved(r) && r.apw < r.division)).toBe(true);
    expect(quick.some((r) => r.knowledge === 'known' && r.spread <= 0.005 && isResolved(r))).toBe(true);
  });

  it('computes Wilson bounds (values worked by hand from the formula)', () => {
    const { lower, upper } = wilsonInterval(4, 5, 3);
    expect(lower).toBeCloseTo(0.2331, 3);
    expect(upper).toBeCloseTo(0.9811, 3);
    expect(wilsonInterval(2000, 2000, 3).lower).toBeCloseTo(2000 / 2009, 6);
  });

  it('fails a fake product that is always wrong and passes one that knows the truth', () => {
    const regime = { ...base, knowledge: 'unknown' as const };
    const truthful = runRegime(regime, 300, 1, () => ({ count: 200, countRaw: 200, expandedUncertainty: 0.4, exact: true, wholePieceRange: 0 }));
    expect(judgeRegime(regime, truthful).pass).toBe(true);
    const wrong = runRegime(regime, 300, 1, () => ({ count: 201, countRaw: 201, expandedUncertainty: 0.4, exact: true }));
    const judged = judgeRegime(regime, wrong);
    expect(judged.pass).toBe(false);
    expect(judged.failures.join()).toMatch(/exact-right 0\/300/);
    expect(judged.failures.join()).toMatch(/coverage 0\/300/);
    const thrown = runRegime(regime, 10, 1, () => {
      throw new RangeError('nope');
    });
    expect(thrown.errors).toBe(10);
    expect(thrown.firstError).toBe('RangeError: nope');
  });
});

describe('clopperPearsonUpper', () => {
  // Exact binomial bounds (Clopper and Pearson 1934): with no failure in n trials the upper bound on
  // the failure-free rate is 1; with 0 of 1 right it is 1 − α; with k of n it solves P(X ≤ k) = α.
  it('gives the exact binomial bound', async () => {
    const { clopperPearsonUpper } = await import('./grid');
    expect(clopperPearsonUpper(5, 5, 0.00135)).toBe(1);
    expect(clopperPearsonUpper(0, 1, 0.00135)).toBeCloseTo(1 - 0.00135, 6);
    // 1 of 2: P(X ≤ 1) = 1 − p² = α → p = √(1 − α)
    expect(clopperPearsonUpper(1, 2, 0.00135)).toBeCloseTo(Math.sqrt(1 - 0.00135), 6);
  });
});
