import { route } from '@/server/http/route';
import { idParamSchema } from '@/server/schemas/common';
import { completeOrderSchema } from '@/server/schemas/orders';
import { completeOrder } from '@/server/services/orders/complete-order';

export const POST = route({ access: 'orders.manage', params: idParamSchema, body: completeOrderSchema }, async ({ params, body, user }) => ({
  order: await completeOrder({ orderId: params.id, input: body, by: user }),
}));
