import 'server-only';
import { Op } from 'sequelize';
import { BuildOrder } from '@/models';
import { getDb } from '../../db';
import { notFound } from '../../errors';
import type { OrderDto } from '../../schemas/orders';
import { ORDER_INCLUDE, toOrderDto } from './order-dto';

export async function getOrder({ orderId }: { orderId: number }): Promise<OrderDto> {
  getDb();
  const order = await BuildOrder.findByPk(orderId, { include: ORDER_INCLUDE });
  if (!order) throw notFound('Build order');
  return toOrderDto(order);
}

export async function listOrders({ status }: { status?: string }): Promise<OrderDto[]> {
  getDb();
  const where = status === 'open' ? { status: { [Op.in]: ['draft', 'released', 'in_progress'] } } : status ? { status } : {};
  const orders = await BuildOrder.findAll({ where, include: ORDER_INCLUDE, order: [['id', 'DESC']], limit: 500 });
  return orders.map(toOrderDto);
}
