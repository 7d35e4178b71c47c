import 'server-only';
import { Kit } from '@/models';
import { getDb } from '../../db';
import { AppError } from '../../errors';
import type { SessionUser } from '../../auth/session';
import type { CreateKitInput, KitDto } from '@/lib/contracts/kits';
import { oncePerKey } from '../requests/once-per-key';
import { KIT_INCLUDE, toKitDto } from './kit-dto';
import { writeComponents } from './write-components';

export async function createKit({
  input,
  by,
  idempotencyKey,
}: {
  input: CreateKitInput;
  by: SessionUser;
  idempotencyKey?: string;
}): Promise<{ kit: KitDto; replayed: boolean }> {
  getDb();
  const { id, replayed } = await oncePerKey({ key: idempotencyKey, userId: by.id, scope: 'kits.create', input }, async (transaction) => {
    if (await Kit.count({ where: { code: input.code, revision: input.revision }, transaction })) {
      throw new AppError('duplicate', `Kit ${input.code} revision ${input.revision} already exists`, { fields: { revision: 'already exists for this kit' } });
    }
    const kit = await Kit.create({ code: input.code, revision: input.revision, description: input.description }, { transaction });
    await writeComponents(kit.id, input.components, transaction);
    return kit.id;
  });
  return { kit: toKitDto((await Kit.findByPk(id, { include: KIT_INCLUDE }))!), replayed };
}
