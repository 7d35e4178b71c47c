import { describe, expect, it } from 'vitest';
import { apwRelativeUncertainty } from './apw';
import { countPieces } from './count';
import { findMaxExactQuantity, findSampleForTarget, isTargetExact, type SampleForTargetInput } from './exact-range';
import { createRandom } from '../scale/prng';

describe('findMaxExactQuantity', () => {
  // COUNTING.md: with c = 2 % and a perfect APW, 4·0.0004·M < 0.25 → M < 156.25 ("about 150").
  it('caps one step at 156 added pieces when c is 2 % however good the APW', () => {
    const r = findMaxExactQuantity({
      averagePieceWeight: 1, apwRelativeUncertainty: 0, pieceSpread: 0.02,
      netWeightUncertainty: 0, sampleQuantity: 10, sampleOnPan: true,
    });
    expect(r.maxUncertainPieces).toBe(156);
    expect(r.maxQuantity).toBe(166);
    expect(r.tooLight).toBe(false);
  });

  // Hand-worked: c = 0, u_r = 0.001 → 4e-6·M² < 0.25 → M < 250; M = 250 gives U = 0.5 exactly, not exact.
  it('keeps the strict inequality when the root is a whole number', () => {
    const r = findMaxExactQuantity({
      averagePieceWeight: 1, apwRelativeUncertainty: 0.001, pieceSpread: 0,
      netWeightUncertainty: 0, sampleQuantity: 20, sampleOnPan: false,
    });
    expect(r.maxUncertainPieces).toBe(249);
    expect(r.maxQuantity).toBe(249);
  });

  // Contract illustration: a = 6.5206e-5, b = 4·(0.0004 + 0.00018844/25) = 0.00163015 (with the
  // shared-zero term), c0 = −0.249246 → root 50.58 → 50 added + 25 = 75.
  it('solves the quadratic for the contract illustration', () => {
    const r = findMaxExactQuantity({
      averagePieceWeight: 0.5948, apwRelativeUncertainty: 0.0040375116, pieceSpread: 0.02,
      netWeightUncertainty: 0.0081649658, sampleQuantity: 25, sampleOnPan: true,
    });
    expect(r.maxUncertainPieces).toBe(50);
    expect(r.maxQuantity).toBe(75);
  });

  // Hand-worked, weighing only (GUM 5.2.2 shared zero): APW = 1, n = 10, c = 0, u(W) = 0.1 → u_r = 0.01;
  // a = 4e-4, b = 4·0.01/10 = 0.004, c0 = 0.04 − 0.25 = −0.21 → M* = (−0.004 + √3.52e-4)/8e-4 = 18.45.
  // Without the shared-zero term b = 0 and M* = √525 = 22.9, which would promise 4 pieces too many.
  it('lets the shared zero shorten the exact range on the pan, not apart', () => {
    const base = {
      averagePieceWeight: 1, apwRelativeUncertainty: 0.01, pieceSpread: 0,
      netWeightUncertainty: 0.1, sampleQuantity: 10, sampleOnPan: true,
    };
    expect(findMaxExactQuantity(base)).toEqual({ maxUncertainPieces: 18, maxQuantity: 28, tooLight: false });
    expect(findMaxExactQuantity({ ...base, sampleOnPan: false }).maxUncertainPieces).toBe(22);
  });

  it('reports too light when the weighing alone reaches half a piece', () => {
    // u(W)/APW = 0.3 → k·u = 0.6 ≥ 0.5 even for M = 0.
    const r = findMaxExactQuantity({
      averagePieceWeight: 0.01, apwRelativeUncertainty: 0.01, pieceSpread: 0.02,
      netWeightUncertainty: 0.003, sampleQuantity: 10, sampleOnPan: true,
    });
    expect(r).toEqual({ maxUncertainPieces: 0, maxQuantity: 0, tooLight: true });
  });

  it('agrees with countPieces: exact at the limit, not exact one piece past it', () => {
    const random = createRandom(20240611);
    for (let i = 0; i < 300; i += 1) {
      const apw = 0.05 + random.next() * 5;
      const n = 1 + Math.floor(random.next() * 80);
      const c = random.next() * 0.06;
      const uW = random.next() * apw * 0.2;
      const onPan = random.next() < 0.5;
      const ur = apwRelativeUncertainty({ sampleNet: n * apw, sampleQuantity: n, pieceSpread: c, sampleNetUncertainty: uW });
      const base = { averagePieceWeight: apw, apwRelativeUncertainty: ur, pieceSpread: c, netWeightUncertainty: uW, sampleQuantity: n, sampleOnPan: onPan };
      const range = findMaxExactQuantity(base);
      if (range.tooLight) continue;
      const at = countPieces({ ...base, bulkNet: range.maxQuantity * apw });
      const past = countPieces({ ...base, bulkNet: (range.maxQuantity + 1) * apw });
      expect(at.exact).toBe(true);
      expect(past.exact).toBe(false);
    }
  });
});

describe('findSampleForTarget', () => {
  const fine: SampleForTargetInput = {
    targetQuantity: 1000, averagePieceWeight: 0.5948, pieceSpread: 0.02,
    netWeightUncertainty: 0.0081649658, sampleOnPan: true,
  };

  // Hand-checked by direct search over n with the COUNTING.md inequality: 866 for T = 1000.
  it('finds the smallest on-pan sample that makes the target exact', () => {
    expect(findSampleForTarget(fine)).toBe(866);
    expect(isTargetExact(fine, 866)).toBe(true);
    expect(isTargetExact(fine, 865)).toBe(false);
  });

  // Hand-worked, weighing only: T = 30, APW = 1, c = 0, u(W) = 0.1, on the pan; with r = (T − n)/n,
  // 4·0.01·(1 + r + r²) < 0.25 ⇔ r < 1.845 ⇔ n ≥ 11 (n = 10: r = 2 gives 7 > 6.25). Without the
  // shared-zero term (1 + r² < 6.25 ⇔ r < 2.29) n = 10 would pass.
  it('needs a larger sample on the pan once the shared zero is counted', () => {
    const input: SampleForTargetInput = {
      targetQuantity: 30, averagePieceWeight: 1, pieceSpread: 0, netWeightUncertainty: 0.1, sampleOnPan: true,
    };
    expect(findSampleForTarget(input)).toBe(11);
    expect(isTargetExact(input, 10)).toBe(false);
  });

  it('matches a plain linear search over n', () => {
    const random = createRandom(7);
    for (let i = 0; i < 60; i += 1) {
      const input: SampleForTargetInput = {
        targetQuantity: 2 + Math.floor(random.next() * 400),
        averagePieceWeight: 0.1 + random.next() * 3,
        pieceSpread: random.next() * 0.05,
        netWeightUncertainty: random.next() * 0.02,
        sampleOnPan: random.next() < 0.5,
      };
      const cap = input.sampleOnPan ? input.targetQuantity - 1 : input.targetQuantity;
      let linear: number | null = null;
      for (let n = 1; n <= cap; n += 1) if (isTargetExact(input, n)) { linear = n; break; }
      expect(findSampleForTarget(input)).toBe(linear);
    }
  });

  // COUNTING.md: apart, the c²·M term alone is 4·1000·0.0004 = 1.6 ≥ 0.25, so no sample helps.
  it('returns null when the piece spread of the target alone exceeds the limit', () => {
    expect(findSampleForTarget({ ...fine, sampleOnPan: false })).toBeNull();
  });

  it('returns null when the piece is too light for the scale', () => {
    expect(findSampleForTarget({ ...fine, averagePieceWeight: 0.02, netWeightUncertainty: 0.008 })).toBeNull();
  });

  it('finds a sample for a bulk weighed apart when the spread is tight', () => {
    const n = findSampleForTarget({ ...fine, pieceSpread: 0.002, sampleOnPan: false, targetQuantity: 500 });
    expect(n).not.toBeNull();
    expect(isTargetExact({ ...fine, pieceSpread: 0.002, sampleOnPan: false, targetQuantity: 500 }, n!)).toBe(true);
    expect(isTargetExact({ ...fine, pieceSpread: 0.002, sampleOnPan: false, targetQuantity: 500 }, n! - 1)).toBe(false);
  });
});
