import { describe, expect, it } from 'vitest';
import { countPieces, countVariance, countVariancePolynomial, toWholePieces, type CountInput } from './count';

// The contract's illustration worked by hand: d = 0.01 g, s_r = 0.005 g → u(W) = 0.0081650 g;
// APW = 14.87/25 = 0.5948 g, u_r(APW) = 0.0040375; N̂ = 601.3/0.5948 = 1010.928.
const example: CountInput = {
  bulkNet: 601.3,
  averagePieceWeight: 0.5948,
  apwRelativeUncertainty: 0.0040375116,
  pieceSpread: 0.02,
  netWeightUncertainty: 0.0081649658,
  sampleQuantity: 25,
  sampleOnPan: true,
};

describe('countPieces', () => {
  // COUNTING.md "Count" (GUM 5.1.2, 5.1.6) with the shared-zero term (GUM 5.2.2): M = 985.928;
  // M·c² = 0.394371; M²·u_r² = 15.845935; u(W)²/APW²·(1 + M/n) = 0.00018844·40.4371 = 0.0076199
  // → u = √16.247926 = 4.03087, U = 8.0617 (COUNTING.md's formula alone: 4.02995).
  it('counts the sample-on-pan case with only the added pieces uncertain', () => {
    const r = countPieces(example);
    expect(r.countRaw).toBeCloseTo(1010.928, 3);
    expect(r.count).toBe(1011);
    expect(r.uncertainPieces).toBeCloseTo(985.928, 3);
    expect(r.standardUncertainty).toBeCloseTo(4.03087, 4);
    expect(r.expandedUncertainty).toBeCloseTo(8.06174, 4);
    expect(r.coverageFactor).toBe(2);
    expect(r.exact).toBe(false);
  });

  // Same load weighed apart (own tare, no shared zero): M = N̂ = 1010.928 → u = √(0.40437 + 16.6597 + 0.000188) = 4.13089.
  it('treats every piece as uncertain when the bulk is weighed apart', () => {
    const r = countPieces({ ...example, sampleOnPan: false });
    expect(r.uncertainPieces).toBeCloseTo(1010.928, 3);
    expect(r.standardUncertainty).toBeCloseTo(4.13089, 4);
  });

  it('keeps the piece-spread term even with a perfect APW', () => {
    // 100 added pieces at c = 5 %, nothing else uncertain: u = √(100·0.0025) = 0.5.
    const v = countVariance({
      uncertainPieces: 100,
      pieceSpread: 0.05,
      apwRelativeUncertainty: 0,
      netWeightUncertainty: 0,
      averagePieceWeight: 1,
      sharedZero: { sampleQuantity: 10, piecesTakenOff: false },
    });
    expect(v).toBeCloseTo(0.25, 12);
  });

  // Hand-worked, GUM 5.2.2 (W_s and W_b share the zero, r = 1/2): APW = 1 g, n = 10, c = 0,
  // u(W) = 0.16 g → u_r(APW) = 0.016, u(W)²/APW² = 0.0256. On the pan, N̂ = 20 (M = 10 = n):
  // M²·u_r² = 0.0256, load 0.0256, shared zero (M/n)·0.0256 = 0.0256 → u² = 0.0768, 1.5× the
  // weighing variance COUNTING.md's formula gives (0.0512). U = 0.5543: not exact, where the
  // formula without the term (U = 0.4525) would wrongly call it exact.
  const weighingOnly: CountInput = {
    bulkNet: 20,
    averagePieceWeight: 1,
    apwRelativeUncertainty: 0.016,
    pieceSpread: 0,
    netWeightUncertainty: 0.16,
    sampleQuantity: 10,
    sampleOnPan: true,
  };

  it('adds the shared-zero covariance on the pan: 1.5× the weighing variance at M = n', () => {
    const r = countPieces(weighingOnly);
    expect(r.standardUncertainty ** 2).toBeCloseTo(0.0768, 12);
    expect(r.expandedUncertainty).toBeCloseTo(0.554256, 6);
    expect(r.exact).toBe(false);
  });

  // Pieces taken off, N̂ = 5 (M = 5): 25·0.000256 + 0.0256·(1 − 5/10) = 0.0192 → u = 0.138564.
  it('subtracts the shared-zero term when pieces are taken off the sample', () => {
    const r = countPieces({ ...weighingOnly, bulkNet: 5 });
    expect(r.standardUncertainty ** 2).toBeCloseTo(0.0192, 12);
    expect(r.standardUncertainty).toBeCloseTo(0.138564, 6);
  });

  // Apart, N̂ = M = 20: 400·0.000256 + 0.0256 = 0.128 → u = 0.357771; no shared indication.
  it('has no shared-zero term when the bulk is weighed apart', () => {
    const r = countPieces({ ...weighingOnly, sampleOnPan: false });
    expect(r.standardUncertainty ** 2).toBeCloseTo(0.128, 12);
  });

  // The same statement as a polynomial in M, for the exact-range quadratic:
  // a = u_r² = 0.000256, b = c² + u(W)²/(n·APW²) = 0.00256, constant = 0.0256.
  it('states u(N̂)² as one polynomial in M that countVariance evaluates', () => {
    const model = {
      pieceSpread: 0, apwRelativeUncertainty: 0.016, netWeightUncertainty: 0.16, averagePieceWeight: 1,
      sharedZero: { sampleQuantity: 10, piecesTakenOff: false },
    };
    const p = countVariancePolynomial(model);
    expect(p.quadratic).toBeCloseTo(0.000256, 15);
    expect(p.linear).toBeCloseTo(0.00256, 15);
    expect(p.constant).toBeCloseTo(0.0256, 15);
    expect(countVariancePolynomial({ ...model, sharedZero: null }).linear).toBe(0);
    expect(countVariance({ ...model, uncertainPieces: 10 })).toBeCloseTo(0.0768, 12);
  });

  it('flags a count as not exact when U reaches half a piece', () => {
    // Only weighing: u = 0.25/1 → U = 0.5 exactly, which is not below 0.5.
    const onlyWeighing: CountInput = {
      bulkNet: 40,
      averagePieceWeight: 1,
      apwRelativeUncertainty: 0,
      pieceSpread: 0,
      netWeightUncertainty: 0.25,
      sampleQuantity: 40,
      sampleOnPan: true,
    };
    const atLimit = countPieces(onlyWeighing);
    expect(atLimit.expandedUncertainty).toBe(0.5);
    expect(atLimit.exact).toBe(false);
    const below = countPieces({ ...onlyWeighing, netWeightUncertainty: 0.24 });
    expect(below.exact).toBe(true);
  });

  it('counts pieces taken off the pan as the uncertain ones', () => {
    const r = countPieces({ ...example, bulkNet: 0.5948 * 15 });
    expect(r.count).toBe(15);
    expect(r.uncertainPieces).toBeCloseTo(10, 9);
  });

  it('uses the coverage factor it is given', () => {
    const r = countPieces({ ...example, coverageFactor: 3 });
    expect(r.expandedUncertainty).toBeCloseTo(3 * r.standardUncertainty, 12);
    expect(r.coverageFactor).toBe(3);
  });

  it('shows U as whole pieces, zero exactly when the count is exact', () => {
    expect(toWholePieces(0.49)).toBe(0);
    expect(toWholePieces(0.5)).toBe(1);
    expect(toWholePieces(0.9)).toBe(1);
    expect(toWholePieces(8.06)).toBe(8);
    expect(toWholePieces(8.5)).toBe(9);
  });
});
