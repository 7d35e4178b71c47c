import { notFound } from 'next/navigation';
import { can } from '@/lib/roles';
import { requirePageUser } from '@/server/auth/authorize';
import { orNotFound } from '@/server/http/or-not-found';
import { idParamSchema } from '@/lib/contracts/common';
import type { AvailabilityLine } from '@/lib/contracts/orders';
import { getOrder } from '@/server/services/orders/get-order';
import { orderAvailability } from '@/server/services/orders/order-availability';
import { OrderView } from './order-view';

export const metadata = { title: 'Build order' };

export default async function OrderPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser('catalog.read', `/orders/${id}`);
  const parsed = idParamSchema.safeParse({ id });
  if (!parsed.success) notFound();
  const orderId = parsed.data.id;
  const order = await orNotFound(getOrder({ orderId }));
  const availability: AvailabilityLine[] | null = order.status === 'draft' ? await orderAvailability(orderId) : null;
  return <OrderView initial={order} initialAvailability={availability} canManage={can(user.role, 'orders.manage')} />;
}
