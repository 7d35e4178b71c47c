import { describe, expect, it } from 'vitest';
import { mpeAt, mpeInE } from './mpe';

// OIML R 76-1:2006 Table 6: MPE on initial verification by load m in e; in service ×2 (3.5.2).
describe('MPE of non-automatic weighing instruments (OIML R 76-1:2006 Table 6)', () => {
  it.each([
    ['I', 0, 0.5],
    ['I', 50_000, 0.5],
    ['I', 50_001, 1],
    ['I', 200_000, 1],
    ['I', 200_001, 1.5],
    ['II', 0, 0.5],
    ['II', 5_000, 0.5],
    ['II', 5_001, 1],
    ['II', 20_000, 1],
    ['II', 20_001, 1.5],
    ['II', 100_000, 1.5],
    ['III', 0, 0.5],
    ['III', 500, 0.5],
    ['III', 501, 1],
    ['III', 2_000, 1],
    ['III', 2_001, 1.5],
    ['III', 10_000, 1.5],
    ['IIII', 0, 0.5],
    ['IIII', 50, 0.5],
    ['IIII', 51, 1],
    ['IIII', 200, 1],
    ['IIII', 201, 1.5],
    ['IIII', 1_000, 1.5],
  ] as const)('class %s at %s e: ±%s e on initial verification', (cls, m, mpe) => {
    expect(mpeInE(cls, m)).toBe(mpe);
    expect(mpeInE(cls, m, 'in_service')).toBe(2 * mpe);
  });

  it('works in mass units: a class III 6 kg × 1 g scale at 2 kg allows ±1 g, at 2.001 kg ±1.5 g', () => {
    expect(mpeAt('III', 1, 2000)).toBe(1);
    expect(mpeAt('III', 1, 2001)).toBe(1.5);
    expect(mpeAt('III', 0.5, 250)).toBe(0.25); // 500 e exactly, despite floating point
    expect(mpeAt('III', 0.5, 250, 'in_service')).toBe(0.5);
  });
});
