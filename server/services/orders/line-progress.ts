import 'server-only';
import { BuildOrderLine } from '@/models';
import type { LineProgress } from './apply-count-to-line';
import { lineUncertainty } from './line-verdict';

export async function lineProgress(orderLineId: number): Promise<LineProgress | null> {
  const line = await BuildOrderLine.findByPk(orderLineId);
  if (!line) return null;
  return {
    id: line.id,
    orderId: line.orderId,
    required: line.required,
    counted: line.counted,
    expandedUncertainty: lineUncertainty(Number(line.varianceSum)),
    wholePieceRange: line.wholePieceRange,
    verdict: line.verdict,
  };
}
