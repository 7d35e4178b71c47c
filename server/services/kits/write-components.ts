import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { KitComponent, Part } from '@/models';
import { AppError } from '../../errors';
import type { CreateKitInput } from '@/lib/contracts/kits';

// Replaces a kit's bill of material in the caller's transaction; every part must exist.
export async function writeComponents(kitId: number, components: CreateKitInput['components'], transaction: Transaction): Promise<void> {
  const ids = components.map((c) => c.partId);
  const found = await Part.findAll({ where: { id: { [Op.in]: ids } }, attributes: ['id'], transaction });
  const known = new Set(found.map((p) => p.id));
  const fields: Record<string, string> = {};
  components.forEach((c, i) => {
    if (!known.has(c.partId)) fields[`components.${i}.partId`] = 'no such part';
  });
  if (Object.keys(fields).length) throw new AppError('validation_failed', 'Some parts of the kit do not exist', { fields });
  await KitComponent.destroy({ where: { kitId }, transaction });
  await KitComponent.bulkCreate(
    components.map((c) => ({ kitId, ...c })),
    { transaction },
  );
}
