import 'server-only';
import type { Bin, Part } from '@/models';
import type { BinDto } from '@/lib/contracts/bins';

export function toBinDto(b: Bin & { part?: Part }): BinDto {
  return {
    id: b.id,
    code: b.code,
    partId: b.partId,
    partNumber: b.part?.partNumber ?? '',
    containerId: b.containerId,
    bookQuantity: b.bookQuantity,
    abcClass: b.abcClass,
    lastCountedAt: b.lastCountedAt?.toISOString() ?? null,
    version: b.version,
  };
}
