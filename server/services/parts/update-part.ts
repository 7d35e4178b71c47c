import 'server-only';
import { Part } from '@/models';
import { getDb } from '../../db';
import { AppError, notFound } from '../../errors';
import type { PartDto, UpdatePartInput } from '@/lib/contracts/parts';
import { toPartDto } from './part-dto';

export async function updatePart({ partId, input }: { partId: number; input: UpdatePartInput }): Promise<PartDto> {
  const db = getDb();
  return db.transaction(async (transaction) => {
    const part = await Part.findByPk(partId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!part) throw notFound('Part');
    if (part.version !== input.version) throw new AppError('stale_version', 'Someone else changed this part; reload and try again');
    if (input.description !== undefined) part.description = input.description;
    if (input.countingMethod !== undefined) part.countingMethod = input.countingMethod;
    await part.save({ transaction });
    return toPartDto(part);
  });
}
