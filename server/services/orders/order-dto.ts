import 'server-only';
import type { BuildOrder, BuildOrderLine, Kit, Part } from '@/models';
import type { OrderDto, OrderLineDto, OrderSummaryDto } from '@/lib/contracts/orders';
import { lineUncertainty } from './line-verdict';

type LoadedOrder = BuildOrder & { kit?: Kit; lines?: Array<BuildOrderLine & { part?: Part }> };

export const ORDER_INCLUDE = [{ association: 'kit' }, { association: 'lines', include: [{ association: 'part' }] }];

function toLineDto(l: BuildOrderLine & { part?: Part }): OrderLineDto {
  return {
    id: l.id,
    partId: l.partId,
    partNumber: l.part?.partNumber ?? '',
    description: l.part?.description ?? '',
    quantityPerKit: l.quantityPerKit,
    required: l.required,
    toleranceBelow: l.toleranceBelow,
    toleranceAbove: l.toleranceAbove,
    counted: l.counted,
    expandedUncertainty: lineUncertainty(Number(l.varianceSum)),
    wholePieceRange: l.wholePieceRange,
    captures: l.captures,
    verdict: l.verdict,
  };
}

export function toOrderDto(o: LoadedOrder): OrderDto {
  const lines = (o.lines ?? []).map(toLineDto).sort((a, b) => a.partNumber.localeCompare(b.partNumber));
  return { ...toOrderSummaryDto(o, { linesDone: lines.filter((l) => l.verdict === 'in').length, lines: lines.length }), lines };
}

export function toOrderSummaryDto(o: LoadedOrder, progress: OrderSummaryDto['progress']): OrderSummaryDto {
  return {
    id: o.id,
    number: o.number,
    kitId: o.kitId,
    kitCode: o.kit?.code ?? '',
    kitRevision: o.kit?.revision ?? '',
    kitDescription: o.kit?.description ?? '',
    quantity: o.quantity,
    dueDate: o.dueDate,
    status: o.status,
    releasedAt: o.releasedAt?.toISOString() ?? null,
    completedAt: o.completedAt?.toISOString() ?? null,
    overrideReason: o.overrideReason,
    progress,
    version: o.version,
  };
}
