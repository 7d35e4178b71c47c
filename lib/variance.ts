/**
 * Cycle-count variance rules. A variance needs approval only when it is beyond BOTH site limits,
 * in pieces and in percent of the book quantity, so that neither a few pieces on a small bin nor a
 * fraction of a percent on a large one stops the stockroom (common practice for count tolerances).
 */
export interface VarianceLimits {
  pieces: number;
  percent: number;
}

export function variancePercent(variance: number, book: number): number {
  if (book === 0) return variance === 0 ? 0 : Infinity;
  return (Math.abs(variance) / book) * 100;
}

export function needsApproval(variance: number, book: number, limits: VarianceLimits): boolean {
  return Math.abs(variance) > limits.pieces && variancePercent(variance, book) > limits.percent;
}

/** Cycle-count intervals by ABC class in days (common practice: A monthly, B quarterly, C twice a year). */
export const CYCLE_DAYS = { A: 30, B: 90, C: 180 } as const;

export function isDue(lastCountedAt: Date | null, abcClass: keyof typeof CYCLE_DAYS, now: Date): boolean {
  return !lastCountedAt || now.getTime() - lastCountedAt.getTime() >= CYCLE_DAYS[abcClass] * 86_400_000;
}
