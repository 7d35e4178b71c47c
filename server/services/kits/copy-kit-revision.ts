import 'server-only';
import { Kit } from '@/models';
import { getDb } from '../../db';
import { AppError, notFound } from '../../errors';
import type { KitDto } from '@/lib/contracts/kits';
import { KIT_INCLUDE, toKitDto } from './kit-dto';
import { writeComponents } from './write-components';

export async function copyKitRevision({ kitId, revision }: { kitId: number; revision: string }): Promise<KitDto> {
  const db = getDb();
  const source = await Kit.findByPk(kitId, { include: KIT_INCLUDE });
  if (!source) throw notFound('Kit');
  const id = await db.transaction(async (transaction) => {
    if (await Kit.count({ where: { code: source.code, revision }, transaction })) {
      throw new AppError('duplicate', `Revision ${revision} of ${source.code} already exists`, { fields: { revision: 'already exists' } });
    }
    const copy = await Kit.create({ code: source.code, revision, description: source.description }, { transaction });
    const dto = toKitDto(source);
    await writeComponents(
      copy.id,
      dto.components.map(({ partId, quantity, toleranceBelow, toleranceAbove }) => ({ partId, quantity, toleranceBelow, toleranceAbove })),
      transaction,
    );
    return copy.id;
  });
  return toKitDto((await Kit.findByPk(id, { include: KIT_INCLUDE }))!);
}
