import 'server-only';
import { BuildOrder } from '@/models';
import { getDb } from '../../db';
import { notFound } from '../../errors';
import type { OrderDto } from '@/lib/contracts/orders';
import { ORDER_INCLUDE, toOrderDto } from './order-dto';

export async function getOrder({ orderId }: { orderId: number }): Promise<OrderDto> {
  getDb();
  const order = await BuildOrder.findByPk(orderId, { include: ORDER_INCLUDE });
  if (!order) throw notFound('Build order');
  return toOrderDto(order);
}
