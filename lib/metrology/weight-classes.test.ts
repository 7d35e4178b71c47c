import { describe, expect, it } from 'vitest';
import { weightMpeMg } from './weight-classes';

// OIML R 111-1:2004 Table 1 (as reproduced in docs/references.md), ± mg.
describe('MPE of weights (OIML R 111-1:2004 Table 1)', () => {
  it.each([
    [1, [0.03, 0.1, 0.3, 1.0, 3.0]],
    [10, [0.06, 0.2, 0.6, 2.0, 6.0]],
    [100, [0.16, 0.5, 1.6, 5.0, 16]],
    [200, [0.3, 1.0, 3.0, 10, 30]],
    [500, [0.8, 2.5, 8.0, 25, 80]],
    [1000, [1.6, 5.0, 16, 50, 160]],
    [2000, [3.0, 10, 30, 100, 300]],
    [5000, [8.0, 25, 80, 250, 800]],
    [10000, [16, 50, 160, 500, 1600]],
    [20000, [30, 100, 300, 1000, 3000]],
  ] as const)('%s g: E2 F1 F2 M1 M2 = %j mg', (nominal, expected) => {
    expect((['E2', 'F1', 'F2', 'M1', 'M2'] as const).map((c) => weightMpeMg(nominal, c))).toEqual(expected);
  });

  it('puts M3 at about three times M2 (from memory)', () => {
    for (const g of [1, 10, 100, 1000, 20000]) {
      const ratio = weightMpeMg(g, 'M3')! / weightMpeMg(g, 'M2')!;
      expect(ratio).toBeGreaterThan(2.9);
      expect(ratio).toBeLessThan(3.5);
    }
  });

  it('has no MPE for a nominal value outside the 1-2-5 series', () => {
    expect(weightMpeMg(3, 'F1')).toBeNull();
  });
});
