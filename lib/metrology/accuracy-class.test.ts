import { describe, expect, it } from 'vitest';
import { classConformity, classRule, minimumCapacity } from './accuracy-class';

// OIML R 76-1:2006, Table 3 (accuracy classes): e, n = Max/e limits and Min in e.
describe('accuracy class rules (OIML R 76-1:2006 Table 3)', () => {
  it.each([
    ['I', 0.001, 50_000, null, 100],
    ['II', 0.01, 100, 100_000, 20],
    ['II', 0.05, 100, 100_000, 20],
    ['II', 0.1, 5_000, 100_000, 50],
    ['III', 0.1, 100, 10_000, 20],
    ['III', 2, 100, 10_000, 20],
    ['III', 5, 500, 10_000, 20],
    ['IIII', 5, 100, 1_000, 10],
  ] as const)('class %s with e = %s g: n from %s to %s, Min = %s e', (cls, e, nMin, nMax, minInE) => {
    expect(classRule(cls, e)).toEqual({ nMin, nMax, minInE });
    expect(minimumCapacity(cls, e)).toBeCloseTo(minInE * e, 12);
  });

  it('accepts a class III 6 kg × 0.5 g bench scale (12 000 intervals is too many, 6 kg × 1 g is fine)', () => {
    expect(classConformity('III', 6000, 1)).toBeNull();
    expect(classConformity('III', 6000, 0.5)).toMatch(/at most 10000/);
  });

  it('refuses too few intervals and too fine an e for the class', () => {
    expect(classConformity('III', 5, 0.1)).toMatch(/at least 100/);
    expect(classConformity('III', 600, 0.01)).toMatch(/at least 0.1 g/);
    expect(classConformity('II', 200, 0.01)).toBeNull();
    expect(classConformity('IIII', 500, 5)).toBeNull();
    expect(classConformity('IIII', 400, 5)).toMatch(/at least 100/);
  });
});
