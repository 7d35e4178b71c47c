import { route } from '@/server/http/route';
import { idParamSchema } from '@/lib/contracts/common';
import { getOrder } from '@/server/services/orders/get-order';

export const GET = route({ access: 'catalog.read', params: idParamSchema }, async ({ params }) => ({ order: await getOrder({ orderId: params.id }) }));
