import 'server-only';
import type { Part, PieceWeightSample } from '@/models';
import type { PartDto, SampleDto } from '@/lib/contracts/parts';
import { partSpreadBelief } from './part-spread-belief';

export function toPartDto(p: Part): PartDto {
  const belief = partSpreadBelief(p);
  return {
    id: p.id,
    partNumber: p.partNumber,
    description: p.description,
    countingMethod: p.countingMethod,
    unit: 'g',
    averagePieceWeight: p.apwG === null ? null : Number(p.apwG),
    apwSampleSize: p.apwSampleSize,
    pieceSpread: p.pieceSpread === null ? null : Number(p.pieceSpread),
    spreadLearned: p.pieceSpread !== null,
    spreadObservations: p.spreadObservations,
    spreadDegreesOfFreedom: belief?.kind === 'learned' ? belief.degreesOfFreedom : null,
    spreadBelief: belief,
    hasPhoto: Boolean(p.photoFile),
    version: p.version,
    updatedAt: p.updatedAt.toISOString(),
  };
}

export function toSampleDto(s: PieceWeightSample): SampleDto {
  return {
    id: s.id,
    partId: s.partId,
    scaleId: s.scaleId,
    unit: 'g',
    quantity: s.quantity,
    netWeight: Number(s.netWeightG),
    averagePieceWeight: Number(s.apwG),
    pieceByPiece: Array.isArray(s.incrementsG) && s.incrementsG.length > 0,
    status: s.status,
    holdReason: s.holdReason,
    decidedBy: s.decidedBy,
    decidedAt: s.decidedAt ? s.decidedAt.toISOString() : null,
    createdBy: s.createdBy,
    createdAt: s.createdAt.toISOString(),
  };
}
