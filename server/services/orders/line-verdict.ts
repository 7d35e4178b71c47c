import 'server-only';
import { COVERAGE_FACTOR, combineLineCaptures, judgeKitLine, type LineCapture, type LineTotal } from '@/lib/weighing';
import type { CountEvent } from '@/models';

// U of a line from its stored u² (captures sharing an APW already counted together), rounded up.
export function lineUncertainty(varianceSum: number): number {
  return Math.ceil(COVERAGE_FACTOR * Math.sqrt(Math.max(0, varianceSum)) * 100) / 100;
}

// A capture as a line sees it. Captures of one sample share its APW; one recorded before that
// was kept counts as independent of the others.
export function toLineCapture(e: CountEvent): LineCapture {
  const known = e.uncertainPieces != null && e.apwRelativeVariance != null;
  return {
    count: e.count,
    exact: e.exact,
    expandedUncertainty: Number(e.expandedUncertainty),
    uncertainPieces: known ? Number(e.uncertainPieces) : 0,
    apwRelativeVariance: known ? e.apwRelativeVariance! : 0,
    apwKey: known ? `${e.scaleId}:${e.sampleQuantity}:${e.sampleNetG}` : `event:${e.id}`,
  };
}

export function lineTotal(events: readonly CountEvent[]): LineTotal {
  return combineLineCaptures(events.map(toLineCapture));
}

export function lineVerdict(line: {
  counted: number;
  wholePieceRange: number;
  required: number;
  toleranceBelow: number;
  toleranceAbove: number;
  captures: number;
}) {
  if (line.captures === 0) return 'open' as const;
  return judgeKitLine(
    { count: line.counted, wholePieceRange: line.wholePieceRange },
    { target: line.required, below: line.toleranceBelow, above: line.toleranceAbove },
  );
}
