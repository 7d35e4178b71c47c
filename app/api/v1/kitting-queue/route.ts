import { route } from '@/server/http/route';
import { kittingQueue } from '@/server/services/orders/kitting-queue';

export const GET = route({ access: 'catalog.read' }, async () => ({ lines: await kittingQueue() }));
