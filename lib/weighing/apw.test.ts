import { describe, expect, it } from 'vitest';
import { apwRelativeUncertainty, averagePieceWeight, measureApw } from './apw';

describe('apw', () => {
  it('divides the sample weight by the pieces in it', () => {
    expect(averagePieceWeight(14.87, 25)).toBeCloseTo(0.5948, 12);
  });

  // GUM 5.1.6 (quotient: relative uncertainties add in quadrature). Hand-worked:
  // c²/n = 0.0004/25 = 1.6e-5; (0.0081650/14.87)² = 3.0150e-7; √(1.630150e-5) = 0.0040375.
  it('combines piece spread over √n with the weighing of the sample', () => {
    const ur = apwRelativeUncertainty({
      sampleNet: 14.87,
      sampleQuantity: 25,
      pieceSpread: 0.02,
      sampleNetUncertainty: 0.008165,
    });
    expect(ur).toBeCloseTo(0.0040375, 7);
  });

  it('reduces to c/√n when the weighing is perfect', () => {
    const ur = apwRelativeUncertainty({ sampleNet: 10, sampleQuantity: 100, pieceSpread: 0.05, sampleNetUncertainty: 0 });
    expect(ur).toBeCloseTo(0.005, 12);
  });

  it('returns the APW and its relative uncertainty together', () => {
    const result = measureApw({ sampleNet: 20, sampleQuantity: 10, pieceSpread: 0, sampleNetUncertainty: 0.02 });
    expect(result.averagePieceWeight).toBe(2);
    expect(result.relativeUncertainty).toBeCloseTo(0.001, 12);
  });
});
