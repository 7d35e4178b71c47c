import { route } from '@/server/http/route';
import { idParamSchema } from '@/lib/contracts/common';
import { getOrder } from '@/server/services/orders/get-order';
import { orderAvailability } from '@/server/services/orders/order-availability';

export const GET = route({ access: 'catalog.read', params: idParamSchema }, async ({ params }) => {
  await getOrder({ orderId: params.id });
  return { lines: await orderAvailability(params.id) };
});
