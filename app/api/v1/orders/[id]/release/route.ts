import { route } from '@/server/http/route';
import { idParamSchema } from '@/server/schemas/common';
import { orderActionSchema } from '@/server/schemas/orders';
import { releaseOrder } from '@/server/services/orders/release-order';

export const POST = route({ access: 'orders.manage', params: idParamSchema, body: orderActionSchema }, async ({ params, body, user }) => ({
  order: await releaseOrder({ orderId: params.id, version: body.version, by: user }),
}));
