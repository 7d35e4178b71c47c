import { describe, expect, it } from 'vitest';
import { countPieces, countVariance, toWholePieces, type CountInput } from './count';

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
  // COUNTING.md "Count", first-order propagation (GUM 5.1.2, 5.1.6):
  // M = 985.928; M·c² = 0.39437; M²·u_r² = 15.8459; u(W)²/APW² = 0.000188 → u = 4.02995, U = 8.0599.
  it('counts the sample-on-pan case with only the added pieces uncertain', () => {
    const r = countPieces(example);
    expect(r.countRaw).toBeCloseTo(1010.928, 3);
    expect(r.count).toBe(1011);
    expect(r.uncertainPieces).toBeCloseTo(985.928, 3);
    expect(r.standardUncertainty).toBeCloseTo(4.02995, 4);
    expect(r.expandedUncertainty).toBeCloseTo(8.0599, 3);
    expect(r.coverageFactor).toBe(2);
    expect(r.exact).toBe(false);
  });

  // Same load weighed apart from the sample: M = N̂ = 1010.928 → u = √(0.40437 + 16.6597 + 0.000188) = 4.13089.
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
    });
    expect(v).toBeCloseTo(0.25, 12);
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
