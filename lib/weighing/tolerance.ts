/** Kit line verdict against its tolerance window (COUNTING.md "Kit line tolerance"). */
import { toWholePieces } from './count';

export interface ToleranceWindow {
  target: number;
  /** Pieces allowed below the target (0 for a −0 window). */
  below: number;
  /** Pieces allowed above the target. */
  above: number;
}

export type ToleranceVerdict = 'in' | 'uncertain' | 'out';

export interface CountedLine {
  /** round(N̂). */
  count: number;
  expandedUncertainty: number;
}

/**
 * 'in' when the whole interval round(N̂) ± U lies in [target − below, target + above],
 * 'uncertain' when only round(N̂) does, 'out' otherwise. Counts are whole pieces, so U
 * is taken as whole pieces (toWholePieces): 0 exactly when the count is exact (U < 0.5).
 */
export function judgeKitLine(line: CountedLine, window: ToleranceWindow): ToleranceVerdict {
  const low = window.target - window.below;
  const high = window.target + window.above;
  if (line.count < low || line.count > high) return 'out';
  const spread = toWholePieces(line.expandedUncertainty);
  return line.count - spread >= low && line.count + spread <= high ? 'in' : 'uncertain';
}
