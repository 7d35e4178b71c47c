import { describe, expect, it } from 'vitest';
import { indicationVariance, netWeightUncertainty, rectangularUncertainty, resolutionUncertainty } from './uncertainty';

describe('uncertainty', () => {
  // JCGM 100:2008 (GUM) F.2.2.1: resolution δx → u = δx/√12; 0.01/3.4641 = 0.0028868.
  it('gives d/√12 for the rounding of one indication', () => {
    expect(resolutionUncertainty(0.01)).toBeCloseTo(0.0028868, 7);
  });

  // GUM F.2.2.1 applied twice (gross and zero): d·√(2/12) = d/√6 ≈ 0.408 d (docs/references.md).
  it('gives d/√6 for a net weight from two rounded indications when repeatability is unknown', () => {
    expect(netWeightUncertainty({ division: 0.1 })).toBeCloseTo(0.040825, 6);
    expect(netWeightUncertainty({ division: 1 }) / 1).toBeCloseTo(1 / Math.sqrt(6), 12);
  });

  // Hand-worked: d = 0.01, s_r = 0.005 → 2·(0.0001/12 + 0.000025) = 6.6667e-5 → u = 0.0081650.
  it('adds repeatability to rounding for each of the two indications', () => {
    expect(indicationVariance({ division: 0.01, repeatability: 0.005 })).toBeCloseTo(3.33333e-5, 9);
    expect(netWeightUncertainty({ division: 0.01, repeatability: 0.005 })).toBeCloseTo(0.008165, 6);
  });

  // GUM 4.3.7: rectangular half-width a → a/√3; an MPE of 0.05 g gives 0.028868 g.
  it('turns a maximum permissible error into a standard uncertainty by a/√3', () => {
    expect(rectangularUncertainty(0.05)).toBeCloseTo(0.028868, 6);
  });

  // Hand-worked: 1000 g at 1e-4 relative adds 0.1 g in quadrature: √(6.6667e-5 + 0.01) = 0.100333.
  it('adds a relative calibration term at the load when two scales are involved', () => {
    const u = netWeightUncertainty({ division: 0.01, repeatability: 0.005 }, { load: 1000, relativeCalibration: 1e-4 });
    expect(u).toBeCloseTo(0.100333, 6);
  });
});
