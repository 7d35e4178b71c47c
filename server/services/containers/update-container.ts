import 'server-only';
import { Container } from '@/models';
import { toGrams } from '@/lib/weighing/units';
import { getDb } from '../../db';
import { AppError, notFound } from '../../errors';
import type { ContainerDto, UpdateContainerInput } from '@/lib/contracts/containers';
import { toContainerDto } from './container-dto';

export async function updateContainer({ containerId, input }: { containerId: number; input: UpdateContainerInput }): Promise<ContainerDto> {
  const db = getDb();
  return db.transaction(async (transaction) => {
    const row = await Container.findByPk(containerId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!row) throw notFound('Container');
    if (row.version !== input.version) throw new AppError('stale_version', 'Someone else changed this container; reload and try again');
    if (input.name !== undefined) row.name = input.name;
    if (input.kind !== undefined) row.kind = input.kind;
    if (input.tare !== undefined) row.tareG = String(toGrams(input.tare, input.unit));
    await row.save({ transaction });
    return toContainerDto(row);
  });
}
