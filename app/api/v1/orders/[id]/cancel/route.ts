import { route } from '@/server/http/route';
import { idParamSchema } from '@/server/schemas/common';
import { orderActionSchema } from '@/server/schemas/orders';
import { cancelOrder } from '@/server/services/orders/cancel-order';

export const POST = route({ access: 'orders.manage', params: idParamSchema, body: orderActionSchema }, async ({ params, body }) => ({
  order: await cancelOrder({ orderId: params.id, version: body.version }),
}));
