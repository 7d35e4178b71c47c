import 'server-only';
import type { Kit, KitComponent, Part } from '@/models';
import type { KitDto } from '@/lib/contracts/kits';

type LoadedKit = Kit & { components?: Array<KitComponent & { part?: Part }> };

export const KIT_INCLUDE = [{ association: 'components', include: [{ association: 'part' }] }];

export function toKitDto(kit: LoadedKit): KitDto {
  return {
    id: kit.id,
    code: kit.code,
    revision: kit.revision,
    description: kit.description,
    active: kit.active,
    components: (kit.components ?? [])
      .map((c) => ({
        partId: c.partId,
        partNumber: c.part?.partNumber ?? '',
        description: c.part?.description ?? '',
        quantity: c.quantity,
        toleranceBelow: c.toleranceBelow,
        toleranceAbove: c.toleranceAbove,
      }))
      .sort((a, b) => a.partNumber.localeCompare(b.partNumber)),
    version: kit.version,
    updatedAt: kit.updatedAt.toISOString(),
  };
}
