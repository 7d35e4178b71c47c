import 'server-only';
import type { CountEvent } from '@/models';
import { toWholePieces, type CountingWarning } from '@/lib/weighing';
import type { CountEventDto } from '@/lib/contracts/counts';

// Captures from before the range was kept: exact ones are 0, others U in whole pieces.
export function wholePieceRangeOf(e: Pick<CountEvent, 'wholePieceRange' | 'exact' | 'expandedUncertainty'>): number {
  if (e.wholePieceRange != null) return e.wholePieceRange;
  return e.exact ? 0 : toWholePieces(Number(e.expandedUncertainty));
}

export function toCountEventDto(e: CountEvent): CountEventDto {
  return {
    id: e.id,
    purpose: e.purpose,
    partId: e.partId,
    scaleId: e.scaleId,
    bulkScaleId: e.bulkScaleId ?? null,
    containerId: e.containerId,
    unit: 'g',
    gross: Number(e.grossG),
    tare: Number(e.tareG),
    net: Number(e.netG),
    sampleQuantity: e.sampleQuantity,
    sampleNetWeight: Number(e.sampleNetG),
    sampleOnPan: e.sampleOnPan,
    averagePieceWeight: Number(e.apwG),
    pieceSpread: Number(e.pieceSpread),
    countRaw: Number(e.countRaw),
    count: e.count,
    standardUncertainty: Number(e.standardUncertainty),
    expandedUncertainty: Number(e.expandedUncertainty),
    coverageFactor: Number(e.standardUncertainty) > 0 ? Math.round((Number(e.expandedUncertainty) / Number(e.standardUncertainty)) * 100) / 100 : 2,
    exact: e.exact,
    probabilityExact: e.probabilityExact == null ? null : Number(e.probabilityExact),
    wholePieceRange: wholePieceRangeOf(e),
    targetQuantity: e.targetQuantity,
    warnings: e.warnings as CountingWarning[],
    operatorId: e.operatorId,
    orderLineId: e.orderLineId ?? null,
    binId: e.binId ?? null,
    createdAt: e.createdAt.toISOString(),
  };
}
