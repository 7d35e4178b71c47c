import 'server-only';
import { BuildOrder, Kit } from '@/models';
import { Op } from 'sequelize';
import { getDb } from '../../db';
import { AppError, notFound } from '../../errors';
import type { KitDto, UpdateKitInput } from '@/lib/contracts/kits';
import { KIT_INCLUDE, toKitDto } from './kit-dto';
import { writeComponents } from './write-components';

// A revision that orders were built from keeps its bill of material: change it by copying to a new revision.
export async function updateKit({ kitId, input }: { kitId: number; input: UpdateKitInput }): Promise<KitDto> {
  const db = getDb();
  await db.transaction(async (transaction) => {
    const kit = await Kit.findByPk(kitId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!kit) throw notFound('Kit');
    if (kit.version !== input.version) throw new AppError('stale_version', 'Someone else changed this kit; reload and try again');
    if (input.components) {
      const used = await BuildOrder.count({ where: { kitId, status: { [Op.ne]: 'draft' } }, transaction });
      if (used) throw new AppError('rule_violated', 'Orders were released from this revision; copy it to a new revision to change its parts');
      await writeComponents(kit.id, input.components, transaction);
    }
    if (input.description !== undefined) kit.description = input.description;
    if (input.active !== undefined) kit.active = input.active;
    kit.changed('updatedAt', true);
    await kit.save({ transaction });
  });
  return toKitDto((await Kit.findByPk(kitId, { include: KIT_INCLUDE }))!);
}
