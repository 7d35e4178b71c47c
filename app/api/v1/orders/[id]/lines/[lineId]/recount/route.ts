import { route } from '@/server/http/route';
import { lineParamsSchema, orderActionSchema } from '@/lib/contracts/orders';
import { recountLine } from '@/server/services/orders/recount-line';

export const POST = route({ access: 'orders.manage', params: lineParamsSchema, body: orderActionSchema }, async ({ params, body }) => ({
  order: await recountLine({ orderId: params.id, lineId: params.lineId, version: body.version }),
}));
