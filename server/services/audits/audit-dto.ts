import 'server-only';
import type { Audit, AuditItem, CountEvent, Part } from '@/models';
import { judgeAuditItem } from '@/lib/sampling/judge-audit';
import type { AuditDto, AuditItemDto, Population } from '@/lib/contracts/audits';
import { wholePieceRangeOf } from '../counting/count-event-dto';

type LoadedItem = AuditItem & { event?: CountEvent & { part?: Part } };

export const AUDIT_INCLUDE = [{ association: 'items', include: [{ association: 'event', include: [{ association: 'part' }] }] }];

export function toAuditItemDto(item: LoadedItem): AuditItemDto {
  const e = item.event!;
  const base = { count: e.count, expandedUncertainty: Number(e.expandedUncertainty), wholePieceRange: wholePieceRangeOf(e), exact: e.exact };
  const judged = item.handCount === null ? null : judgeAuditItem({ ...base, handCount: item.handCount });
  return {
    id: item.id,
    countEventId: item.countEventId,
    partId: e.partId,
    partNumber: e.part?.partNumber ?? '',
    scaleId: e.scaleId,
    operatorId: e.operatorId,
    countedAt: e.createdAt.toISOString(),
    ...base,
    handCount: item.handCount,
    error: judged?.error ?? null,
    withinUncertainty: judged?.withinUncertainty ?? null,
    exactRight: judged?.exactRight ?? null,
  };
}

export function toAuditDto(a: Audit & { items?: LoadedItem[] }): AuditDto {
  return {
    id: a.id,
    population: a.population as Population,
    lotSize: a.lotSize,
    level: a.level,
    aql: Number(a.aql),
    codeLetter: a.codeLetter,
    sampleSize: a.sampleSize,
    accept: a.accept,
    reject: a.reject,
    seed: Number(a.seed),
    status: a.status,
    defects: a.defects,
    verdict: a.verdict,
    items: (a.items ?? []).map(toAuditItemDto).sort((x, y) => x.countEventId - y.countEventId),
    createdAt: a.createdAt.toISOString(),
  };
}
