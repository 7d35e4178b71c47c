import { route } from '@/server/http/route';
import { idParamSchema } from '@/lib/contracts/common';
import { completeOrderSchema } from '@/lib/contracts/orders';
import { completeOrder } from '@/server/services/orders/complete-order';

export const POST = route({ access: 'orders.manage', params: idParamSchema, body: completeOrderSchema }, async ({ params, body, user }) => ({
  order: await completeOrder({ orderId: params.id, input: body, by: user }),
}));
