import 'server-only';
import type { Transaction } from 'sequelize';
import { BuildOrder } from '@/models';
import { AppError, notFound } from '../../errors';

// The order a change is made to, row-locked for the caller's transaction, as the page last saw it.
export async function lockOrder(orderId: number, version: number, transaction: Transaction): Promise<BuildOrder> {
  const order = await BuildOrder.findByPk(orderId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!order) throw notFound('Build order');
  if (order.version !== version) throw new AppError('stale_version', 'Someone else changed this order; reload and try again');
  return order;
}
