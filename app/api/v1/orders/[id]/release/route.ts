import { route } from '@/server/http/route';
import { idParamSchema } from '@/lib/contracts/common';
import { orderActionSchema } from '@/lib/contracts/orders';
import { releaseOrder } from '@/server/services/orders/release-order';

export const POST = route({ access: 'orders.manage', params: idParamSchema, body: orderActionSchema }, async ({ params, body, user }) => ({
  order: await releaseOrder({ orderId: params.id, version: body.version, by: user }),
}));
