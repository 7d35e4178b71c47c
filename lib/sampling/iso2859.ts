/**
 * Single sampling plans for normal inspection, ISO 2859-1 (equivalently ANSI/ASQ Z1.4):
 * Table 1 (sample-size code letters) and Table 2-A (master table). Level II letters and the
 * master table's pattern are as reproduced in docs/references.md; levels I and III from memory.
 */
export type InspectionLevel = 'I' | 'II' | 'III';
export const AQLS = [0.065, 0.1, 0.15, 0.25, 0.4, 0.65, 1.0, 1.5, 2.5, 4.0, 6.5] as const;
export type Aql = (typeof AQLS)[number];

const LETTERS = 'ABCDEFGHJKLMNPQR';
const SAMPLE_SIZES = [2, 3, 5, 8, 13, 20, 32, 50, 80, 125, 200, 315, 500, 800, 1250, 2000];

// Lot-size upper limits with letters for levels I, II, III.
const TABLE_1: ReadonlyArray<readonly [number, string, string, string]> = [
  [8, 'A', 'A', 'B'],
  [15, 'A', 'B', 'C'],
  [25, 'B', 'C', 'D'],
  [50, 'C', 'D', 'E'],
  [90, 'C', 'E', 'F'],
  [150, 'D', 'F', 'G'],
  [280, 'E', 'G', 'H'],
  [500, 'F', 'H', 'J'],
  [1_200, 'G', 'J', 'K'],
  [3_200, 'H', 'K', 'L'],
  [10_000, 'J', 'L', 'M'],
  [35_000, 'K', 'M', 'N'],
  [150_000, 'L', 'N', 'P'],
  [500_000, 'M', 'P', 'Q'],
  [Infinity, 'N', 'Q', 'R'],
];

export function codeLetter(lotSize: number, level: InspectionLevel = 'II'): string {
  if (!Number.isInteger(lotSize) || lotSize < 2) throw new RangeError('codeLetter: lotSize must be a whole number of at least 2');
  const row = TABLE_1.find(([upper]) => lotSize <= upper)!;
  return level === 'I' ? row[1] : level === 'II' ? row[2] : row[3];
}

export function sampleSizeFor(letter: string): number {
  return SAMPLE_SIZES[LETTERS.indexOf(letter)];
}

// Where the 0/1 plan sits in each AQL column (letter index).
const ZERO_ONE_AT: Readonly<Record<string, number>> = {
  '6.5': 0,
  '4': 1,
  '2.5': 2,
  '1.5': 3,
  '1': 4,
  '0.65': 5,
  '0.4': 6,
  '0.25': 7,
  '0.15': 8,
  '0.1': 9,
  '0.065': 10,
};
// Down a column from the 0/1 cell: 0/1, ↑, ↓, then these acceptance numbers (Re = Ac + 1).
const AFTER_ARROWS = [1, 2, 3, 5, 7, 10, 14, 21];

type Cell = { ac: number } | 'up' | 'down';

function cell(aql: Aql, row: number): Cell {
  const start = ZERO_ONE_AT[String(aql)];
  const offset = row - start;
  if (offset < 0) return 'down';
  if (offset === 0) return { ac: 0 };
  if (offset === 1) return 'up';
  if (offset === 2) return 'down';
  const ac = AFTER_ARROWS[offset - 3];
  return ac === undefined ? 'up' : { ac };
}

export interface SamplingPlan {
  codeLetter: string;
  sampleSize: number;
  accept: number;
  reject: number;
  /** True when the sample would reach the lot: inspect every item instead. */
  inspectAll: boolean;
}

/** The plan for a lot: follow the arrows to the first plan, and take that plan's sample size. */
export function samplingPlan(lotSize: number, aql: Aql, level: InspectionLevel = 'II'): SamplingPlan {
  if (!AQLS.includes(aql)) throw new RangeError(`samplingPlan: aql must be one of ${AQLS.join(', ')}`);
  const letter = codeLetter(lotSize, level);
  let row = LETTERS.indexOf(letter);
  let c = cell(aql, row);
  while (typeof c === 'string') {
    row += c === 'down' ? 1 : -1;
    c = cell(aql, row);
  }
  const sampleSize = SAMPLE_SIZES[row];
  return { codeLetter: letter, sampleSize: Math.min(sampleSize, lotSize), accept: c.ac, reject: c.ac + 1, inspectAll: sampleSize >= lotSize };
}
