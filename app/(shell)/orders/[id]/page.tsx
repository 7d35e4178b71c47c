import { notFound } from 'next/navigation';
import { can } from '@/lib/roles';
import { requirePageUser } from '@/server/auth/authorize';
import { AppError } from '@/server/errors';
import type { AvailabilityLine, OrderDto } from '@/server/schemas/orders';
import { getOrder } from '@/server/services/orders/get-order';
import { orderAvailability } from '@/server/services/orders/order-availability';
import { OrderView } from './order-view';

export const metadata = { title: 'Build order' };

export default async function OrderPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser('catalog.read', `/orders/${id}`);
  const orderId = Number(id);
  if (!Number.isInteger(orderId) || orderId <= 0) notFound();
  let order: OrderDto;
  try {
    order = await getOrder({ orderId });
  } catch (err) {
    if (err instanceof AppError && err.code === 'not_found') notFound();
    throw err;
  }
  const availability: AvailabilityLine[] | null = order.status === 'draft' ? await orderAvailability(orderId) : null;
  return <OrderView initial={order} initialAvailability={availability} canManage={can(user.role, 'orders.manage')} />;
}
