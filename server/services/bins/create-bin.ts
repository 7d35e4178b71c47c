import 'server-only';
import { Bin, Container, Part, StockMovement } from '@/models';
import type { SessionUser } from '../../auth/session';
import { getDb } from '../../db';
import { AppError } from '../../errors';
import type { BinDto, CreateBinInput } from '@/lib/contracts/bins';
import { oncePerKey } from '../requests/once-per-key';
import { addOnHand } from '../stock/add-on-hand';
import { toBinDto } from './bin-dto';

// A new bin brings its opening quantity into stock as an 'initial' movement.
export async function createBin({
  input,
  by,
  idempotencyKey,
}: {
  input: CreateBinInput;
  by: SessionUser;
  idempotencyKey?: string;
}): Promise<{ bin: BinDto; replayed: boolean }> {
  getDb();
  const { id, replayed } = await oncePerKey({ key: idempotencyKey, userId: by.id, scope: 'bins.create', input }, async (transaction) => {
    if (!(await Part.count({ where: { id: input.partId }, transaction })))
      throw new AppError('not_found', 'Part was not found', { fields: { partId: 'no such part' } });
    if (input.containerId && !(await Container.count({ where: { id: input.containerId }, transaction }))) {
      throw new AppError('not_found', 'Container was not found', { fields: { containerId: 'no such container' } });
    }
    const bin = await Bin.create(
      {
        code: input.code,
        partId: input.partId,
        containerId: input.containerId ?? null,
        bookQuantity: input.bookQuantity,
        abcClass: input.abcClass,
        lastCountedAt: null,
      },
      { transaction },
    );
    if (input.bookQuantity) {
      await StockMovement.create(
        {
          partId: input.partId,
          binId: bin.id,
          delta: input.bookQuantity,
          reason: 'initial',
          refType: 'bin',
          refId: bin.id,
          note: 'opening quantity',
          createdBy: by.id,
        },
        { transaction },
      );
    }
    await addOnHand(input.partId, input.bookQuantity, transaction);
    return bin.id;
  });
  return { bin: toBinDto((await Bin.findByPk(id, { include: [{ association: 'part' }] }))!), replayed };
}
