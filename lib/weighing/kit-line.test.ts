import { describe, expect, it } from 'vitest';
import { combineLineCaptures, type LineCapture } from './kit-line';

const capture = (over: Partial<LineCapture>): LineCapture => ({
  count: 100,
  exact: false,
  expandedUncertainty: 2,
  uncertainPieces: 100,
  apwRelativeVariance: 0,
  apwKey: 'a',
  ...over,
});

describe('combineLineCaptures', () => {
  // JCGM 100:2008 5.2.2 with a correlation of 1 through the shared APW: two captures of M = 100
  // with u_r(APW)² = 1e-4 each carry 100²·1e-4 = 1 piece² from the APW; apart from it u² = 1 − 1 = 0
  // (U = 2 → u² = 1). Shared: (100 + 100)²·1e-4 = 4 → u = 2; independent they would give √2.
  it('counts the error of a shared APW once, fully correlated, not as independent', () => {
    const shared = combineLineCaptures([capture({ apwRelativeVariance: 1e-4 }), capture({ apwRelativeVariance: 1e-4 })]);
    expect(shared.standardUncertainty).toBeCloseTo(2, 9);
    const twoSamples = combineLineCaptures([capture({ apwRelativeVariance: 1e-4 }), capture({ apwRelativeVariance: 1e-4, apwKey: 'b' })]);
    expect(twoSamples.standardUncertainty).toBeCloseTo(Math.SQRT2, 9);
    expect(shared.counted).toBe(200);
  });

  it('adds what each capture has of its own in quadrature', () => {
    const r = combineLineCaptures([capture({ expandedUncertainty: 0.6 }), capture({ expandedUncertainty: 0.8, apwKey: 'b' })]);
    expect(r.standardUncertainty).toBeCloseTo(Math.sqrt(0.09 + 0.16), 12);
  });

  it('is exact, ± 0, only when every capture was exact', () => {
    const exact = capture({ exact: true, expandedUncertainty: 0.5, uncertainPieces: 40 });
    expect(combineLineCaptures([exact, { ...exact, apwKey: 'b' }])).toMatchObject({ exact: true, wholePieceRange: 0 });
    const mixed = combineLineCaptures([exact, capture({ expandedUncertainty: 0.7 })]);
    expect(mixed.exact).toBe(false);
    expect(mixed.wholePieceRange).toBeGreaterThanOrEqual(1);
  });
});
