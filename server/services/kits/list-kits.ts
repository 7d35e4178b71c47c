import 'server-only';
import { Kit } from '@/models';
import { getDb } from '../../db';
import { notFound } from '../../errors';
import type { KitDto } from '@/lib/contracts/kits';
import { KIT_INCLUDE, toKitDto } from './kit-dto';

export async function listKits(): Promise<KitDto[]> {
  getDb();
  const kits = await Kit.findAll({
    include: KIT_INCLUDE,
    order: [
      ['code', 'ASC'],
      ['revision', 'ASC'],
    ],
  });
  return kits.map(toKitDto);
}

export async function getKit({ kitId }: { kitId: number }): Promise<KitDto> {
  getDb();
  const kit = await Kit.findByPk(kitId, { include: KIT_INCLUDE });
  if (!kit) throw notFound('Kit');
  return toKitDto(kit);
}
