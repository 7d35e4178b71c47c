/** Kit line verdict against its tolerance window (docs/counting-model.md, "Kit lines"). */

export interface ToleranceWindow {
  target: number;
  /** Pieces allowed below the target (0 for a −0 window). */
  below: number;
  /** Pieces allowed above the target. */
  above: number;
}

export type ToleranceVerdict = 'in' | 'uncertain' | 'out';

export interface CountedLine {
  /** The counted pieces. */
  count: number;
  /** ± whole pieces at 95 %; 0 exactly when the count is exact. */
  wholePieceRange: number;
}

/**
 * 'in' when the whole range count ± wholePieceRange lies in [target − below, target + above],
 * 'uncertain' when only the count does, 'out' otherwise.
 */
export function judgeKitLine(line: CountedLine, window: ToleranceWindow): ToleranceVerdict {
  const low = window.target - window.below;
  const high = window.target + window.above;
  if (line.count < low || line.count > high) return 'out';
  const spread = line.wholePieceRange;
  return line.count - spread >= low && line.count + spread <= high ? 'in' : 'uncertain';
}

/**
 * U as whole pieces, half up, at least 1: for counts recorded before a range was kept with them,
 * and for sums of non-exact counts (if |N̂ − N| < U then |round(N̂) − N| ≤ round(U)).
 */
export function toWholePieces(expandedUncertainty: number): number {
  return Math.max(1, Math.floor(Math.max(0, expandedUncertainty) + 0.5));
}
