/**
 * Maximum permissible errors of weights, OIML R 111-1:2004 Table 1, in mg.
 * The 1 g, 10 g, 100 g, 200 g, 500 g and 1–20 kg rows are as reproduced in docs/references.md;
 * the 2 g, 5 g, 20 g, 50 g and 50 kg rows and class M3 follow the same table from memory.
 */
export type WeightClass = 'E2' | 'F1' | 'F2' | 'M1' | 'M2' | 'M3';
export const WEIGHT_CLASSES: readonly WeightClass[] = ['E2', 'F1', 'F2', 'M1', 'M2', 'M3'];

// nominal (g) → MPE (mg) for E2, F1, F2, M1, M2, M3
const TABLE: ReadonlyArray<readonly [number, readonly [number, number, number, number, number, number]]> = [
  [1, [0.03, 0.1, 0.3, 1, 3, 10]],
  [2, [0.04, 0.12, 0.4, 1.2, 4, 12]],
  [5, [0.05, 0.16, 0.5, 1.6, 5, 16]],
  [10, [0.06, 0.2, 0.6, 2, 6, 20]],
  [20, [0.08, 0.25, 0.8, 2.5, 8, 25]],
  [50, [0.1, 0.3, 1, 3, 10, 30]],
  [100, [0.16, 0.5, 1.6, 5, 16, 50]],
  [200, [0.3, 1, 3, 10, 30, 100]],
  [500, [0.8, 2.5, 8, 25, 80, 250]],
  [1_000, [1.6, 5, 16, 50, 160, 500]],
  [2_000, [3, 10, 30, 100, 300, 1_000]],
  [5_000, [8, 25, 80, 250, 800, 2_500]],
  [10_000, [16, 50, 160, 500, 1_600, 5_000]],
  [20_000, [30, 100, 300, 1_000, 3_000, 10_000]],
  [50_000, [80, 250, 800, 2_500, 8_000, 25_000]],
];

export const NOMINAL_VALUES_G: readonly number[] = TABLE.map(([g]) => g);

/** MPE in mg, or null when the nominal value is not one the table lists. */
export function weightMpeMg(nominalG: number, cls: WeightClass): number | null {
  const row = TABLE.find(([g]) => Math.abs(g - nominalG) < 1e-9);
  return row ? row[1][WEIGHT_CLASSES.indexOf(cls)] : null;
}
