import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { BuildOrder, BuildOrderLine, CountEvent } from '@/models';
import { AppError } from '../../errors';
import { lineTotal, lineUncertainty, lineVerdict } from './line-verdict';

export interface LineProgress {
  id: number;
  orderId: number;
  required: number;
  counted: number;
  expandedUncertainty: number;
  wholePieceRange: number;
  verdict: string;
}

// Adds one capture (already written, in this transaction) to a build-order line, and moves a
// released order to in progress. The line row is locked so parallel captures add up; the line's
// uncertainty is recomputed from all its captures, so a shared APW is counted once.
export async function applyCountToLine(opts: { orderLineId: number; partId: number; count: number }, transaction: Transaction): Promise<LineProgress> {
  const line = await BuildOrderLine.findByPk(opts.orderLineId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!line) throw new AppError('not_found', 'Order line was not found', { fields: { orderLineId: 'no such line' } });
  if (line.partId !== opts.partId)
    throw new AppError('validation_failed', 'That line is for another part', { fields: { partId: 'does not match the order line' } });
  const order = await BuildOrder.findByPk(line.orderId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!order || (order.status !== 'released' && order.status !== 'in_progress')) {
    throw new AppError('rule_violated', `Order ${order?.number ?? ''} is not open for kitting (${order?.status ?? 'missing'})`);
  }
  // A line counted in full takes no more pieces: a second whole count would double the kit line.
  if (line.counted >= line.required) {
    throw new AppError('rule_violated', `This line is already counted in full (${line.counted} of ${line.required}); the planner decides what happens to it`, {
      fields: { orderLineId: 'already counted in full' },
    });
  }
  const since = line.recountAfterEventId == null ? {} : { id: { [Op.gt]: line.recountAfterEventId } };
  const total = lineTotal(await CountEvent.findAll({ where: { orderLineId: line.id, ...since }, transaction }));
  const varianceSum = total.standardUncertainty ** 2;
  line.counted += opts.count;
  line.captures += 1;
  line.varianceSum = String(varianceSum);
  line.wholePieceRange = total.wholePieceRange;
  line.verdict = lineVerdict({ ...line.get(), counted: line.counted, captures: line.captures, wholePieceRange: total.wholePieceRange });
  await line.save({ transaction });
  if (order.status === 'released') {
    order.status = 'in_progress';
    await order.save({ transaction });
  }
  return {
    id: line.id,
    orderId: line.orderId,
    required: line.required,
    counted: line.counted,
    expandedUncertainty: lineUncertainty(varianceSum),
    wholePieceRange: line.wholePieceRange,
    verdict: line.verdict,
  };
}
