import { displayDecimals } from '@/lib/weighing/display-decimals';

// The trace's weight axis: ticks on whole divisions (1, 2 or 5 × 10^k of d), labelled with the
// division's decimals, over at least 10 d. A still pan would otherwise be drawn over a span finer
// than the scale resolves, with tick labels that round to the same text.
export function weightAxis(division: number): { incrs: number[]; format: (grams: number) => string; range: (min: number, max: number) => [number, number] } {
  const decimals = displayDecimals(division);
  const incrs = [];
  for (let k = 0; k <= 9; k++) for (const m of [1, 2, 5]) incrs.push(Number((m * 10 ** k * division).toFixed(decimals)));
  return {
    incrs,
    format: (grams) => grams.toFixed(decimals),
    range: (min, max) => {
      if (!Number.isFinite(min) || !Number.isFinite(max)) return [-5 * division, 5 * division];
      const mid = (min + max) / 2;
      const half = Math.max(5 * division, ((max - min) / 2) * 1.1);
      return [mid - half, mid + half];
    },
  };
}
