/**
 * Accuracy classes of non-automatic weighing instruments: OIML R 76-1:2006, Table 3
 * (verification scale interval e, number of intervals n = Max/e, minimum capacity Min).
 * All masses in grams.
 */
export type AccuracyClass = 'I' | 'II' | 'III' | 'IIII';
export const ACCURACY_CLASSES: readonly AccuracyClass[] = ['I', 'II', 'III', 'IIII'];

export interface ClassRule {
  /** Smallest and largest n = Max/e allowed (null: no upper limit). */
  nMin: number;
  nMax: number | null;
  /** Minimum capacity as a multiple of e. */
  minInE: number;
}

// Table 3 rows; class II and III split by the size of e.
export function classRule(cls: AccuracyClass, e: number): ClassRule {
  switch (cls) {
    case 'I':
      return { nMin: 50_000, nMax: null, minInE: 100 };
    case 'II':
      return e >= 0.1 ? { nMin: 5_000, nMax: 100_000, minInE: 50 } : { nMin: 100, nMax: 100_000, minInE: 20 };
    case 'III':
      return e >= 5 ? { nMin: 500, nMax: 10_000, minInE: 20 } : { nMin: 100, nMax: 10_000, minInE: 20 };
    case 'IIII':
      return { nMin: 100, nMax: 1_000, minInE: 10 };
  }
}

/** Min = k·e per OIML R 76-1 Table 3. */
export function minimumCapacity(cls: AccuracyClass, e: number): number {
  return classRule(cls, e).minInE * e;
}

/** n = Max/e, rounded to cancel floating-point noise (Max is a whole multiple of e in practice). */
export function intervalCount(max: number, e: number): number {
  return Math.round((max / e) * 1e6) / 1e6;
}

/** Explains why Max and e do not fit the class, or null when they do. */
export function classConformity(cls: AccuracyClass, max: number, e: number): string | null {
  const rule = classRule(cls, e);
  const n = intervalCount(max, e);
  if (cls === 'I' && e < 0.001) return 'class I needs e of at least 1 mg';
  if (cls === 'II' && e < 0.001) return 'class II needs e of at least 1 mg';
  if (cls === 'III' && e < 0.1) return 'class III needs e of at least 0.1 g';
  if (cls === 'IIII' && e < 5) return 'class IIII needs e of at least 5 g';
  if (n < rule.nMin) return `Max/e is ${n}; class ${cls} needs at least ${rule.nMin} intervals`;
  if (rule.nMax !== null && n > rule.nMax) return `Max/e is ${n}; class ${cls} allows at most ${rule.nMax} intervals`;
  return null;
}
