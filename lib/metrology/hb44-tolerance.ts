/**
 * NIST Handbook 44 (§2.20 Scales), Table 6: maintenance tolerances in divisions e by test load
 * in divisions; acceptance tolerances are one half of maintenance (T.N.3.2).
 * Class III as reproduced; classes I, II and IIII from memory (see docs/references.md).
 */
import type { AccuracyClass } from './accuracy-class';

export type Hb44Stage = 'acceptance' | 'maintenance';

// [upper load in d, tolerance in d]; the last row has no upper limit.
const TABLE: Readonly<Record<AccuracyClass, ReadonlyArray<readonly [number, number]>>> = {
  I: [
    [50_000, 1],
    [200_000, 2],
    [Infinity, 3],
  ],
  II: [
    [5_000, 1],
    [20_000, 2],
    [Infinity, 3],
  ],
  III: [
    [500, 1],
    [2_000, 2],
    [4_000, 3],
    [Infinity, 5],
  ],
  IIII: [
    [50, 1],
    [200, 2],
    [400, 3],
    [Infinity, 5],
  ],
};

export function hb44ToleranceInD(cls: AccuracyClass, loadInD: number, stage: Hb44Stage = 'maintenance'): number {
  const m = Math.abs(loadInD);
  const row = TABLE[cls].find(([upper]) => m <= upper)!;
  return stage === 'acceptance' ? row[1] / 2 : row[1];
}
