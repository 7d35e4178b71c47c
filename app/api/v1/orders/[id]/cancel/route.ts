import { route } from '@/server/http/route';
import { idParamSchema } from '@/lib/contracts/common';
import { orderActionSchema } from '@/lib/contracts/orders';
import { cancelOrder } from '@/server/services/orders/cancel-order';

export const POST = route({ access: 'orders.manage', params: idParamSchema, body: orderActionSchema }, async ({ params, body }) => ({
  order: await cancelOrder({ orderId: params.id, version: body.version }),
}));
