import 'server-only';
import { COVERAGE_FACTOR, judgeKitLine } from '@/lib/weighing';
import type { LineVerdict } from '@/models/columns';

// Captures on one line are independent weighings: their variances add (GUM 5.1.2, uncorrelated inputs).
export function lineUncertainty(varianceSum: number): number {
  return Math.ceil(COVERAGE_FACTOR * Math.sqrt(Math.max(0, varianceSum)) * 100) / 100;
}

export function lineVerdict(line: { counted: number; varianceSum: number; required: number; toleranceBelow: number; toleranceAbove: number; captures: number }): LineVerdict {
  if (line.captures === 0) return 'open';
  return judgeKitLine(
    { count: line.counted, expandedUncertainty: COVERAGE_FACTOR * Math.sqrt(Math.max(0, line.varianceSum)) },
    { target: line.required, below: line.toleranceBelow, above: line.toleranceAbove },
  );
}
