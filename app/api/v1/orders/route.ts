import { createdOnce, idempotencyKeyOf } from '@/server/http/idempotency-key';
import { route } from '@/server/http/route';
import { createOrderSchema, listOrdersSchema } from '@/lib/contracts/orders';
import { createOrder } from '@/server/services/orders/create-order';
import { listOrders } from '@/server/services/orders/list-orders';

export const GET = route({ access: 'catalog.read', query: listOrdersSchema }, async ({ query }) => listOrders(query));

export const POST = route({ access: 'orders.manage', body: createOrderSchema }, async ({ req, body, user }) => {
  const { order, replayed } = await createOrder({ input: body, by: user, idempotencyKey: idempotencyKeyOf(req, { required: false }) });
  return createdOnce({ order }, replayed);
});
