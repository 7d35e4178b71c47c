import 'server-only';
import { Kit } from '@/models';
import { getDb } from '../../db';
import { AppError } from '../../errors';
import type { CreateKitInput, KitDto } from '../../schemas/kits';
import { KIT_INCLUDE, toKitDto } from './kit-dto';
import { writeComponents } from './write-components';

export async function createKit({ input }: { input: CreateKitInput }): Promise<KitDto> {
  const db = getDb();
  const id = await db.transaction(async (transaction) => {
    if (await Kit.count({ where: { code: input.code, revision: input.revision }, transaction })) {
      throw new AppError('duplicate', `Kit ${input.code} revision ${input.revision} already exists`, { fields: { revision: 'already exists for this kit' } });
    }
    const kit = await Kit.create({ code: input.code, revision: input.revision, description: input.description }, { transaction });
    await writeComponents(kit.id, input.components, transaction);
    return kit.id;
  });
  return toKitDto((await Kit.findByPk(id, { include: KIT_INCLUDE }))!);
}
