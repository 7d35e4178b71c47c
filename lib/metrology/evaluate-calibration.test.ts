import { describe, expect, it } from 'vitest';
import { defaultTestLoads, evaluateCalibration, repeatabilityStdDev } from './evaluate-calibration';

// A class III scale, Max 6 kg, e = 0.5 g (n = 12 000 is above the class limit, but the MPE bands
// of OIML R 76-1 Table 6 still apply per load): 500 e = 250 g, 2 000 e = 1 kg.
const base = { accuracyClass: 'III' as const, verificationInterval: 0.5, capacity: 6000 };

describe('evaluating a scale test (OIML R 76-1:2006 Table 6, 3.6.1, 3.6.2)', () => {
  it('passes errors up to the MPE of each load band and fails beyond', () => {
    const v = evaluateCalibration({
      ...base,
      stage: 'initial',
      points: [
        { load: 250, indication: 250.25 }, // 500 e: MPE 0.5 e = 0.25 g → pass at the limit
        { load: 1000, indication: 1000.5 }, // 2 000 e: MPE 1 e = 0.5 g → pass
        { load: 3000, indication: 3001 }, // 6 000 e: MPE 1.5 e = 0.75 g → fail
      ],
    });
    expect(v.points.map((p) => [p.error, p.mpe, p.pass])).toEqual([
      [0.25, 0.25, true],
      [0.5, 0.5, true],
      [1, 0.75, false],
    ]);
    expect(v.pass).toBe(false);
  });

  it('doubles the MPE in service (R 76-1 3.5.2)', () => {
    const v = evaluateCalibration({ ...base, stage: 'in_service', points: [{ load: 3000, indication: 3001 }] });
    expect(v.points[0]).toMatchObject({ mpe: 1.5, pass: true });
  });

  it('judges repeatability by the range against the MPE, and eccentricity by the largest error', () => {
    const v = evaluateCalibration({
      ...base,
      stage: 'initial',
      points: [{ load: 1000, indication: 1000.5 }],
      repeatability: { load: 3000, indications: [3000, 3000.5, 3000] },
      eccentricity: { load: 2000, indications: [2000, 2000.5, 1999.5, 2001] },
    });
    expect(v.repeatability).toEqual({ range: 0.5, mpe: 0.75, pass: true });
    expect(v.eccentricity).toEqual({ maxError: 1, mpe: 0.75, pass: false });
    expect(v.minimumCapacity).toBe(10); // 20 e (Table 3)
    expect(v.intervals).toBe(12000);
    expect(v.pass).toBe(false);
  });

  it('proposes Min, 500 e, 2 000 e and Max as the class III test loads', () => {
    expect(defaultTestLoads('III', 1, 6000)).toEqual([20, 500, 2000, 6000]);
    expect(defaultTestLoads('III', 1, 1500)).toEqual([20, 500, 1500]);
  });

  it('estimates s_r as the sample standard deviation of repeated indications', () => {
    expect(repeatabilityStdDev([3000, 3000.5, 3000])).toBeCloseTo(0.288675, 5);
    expect(repeatabilityStdDev([1])).toBeNull();
  });
});
