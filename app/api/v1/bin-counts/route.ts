import { z } from 'zod';
import { route } from '@/server/http/route';
import { listBinCounts } from '@/server/services/bins/list-bin-counts';

const query = z.object({ status: z.enum(['applied', 'pending', 'approved', 'rejected']).optional(), binId: z.coerce.number().int().positive().optional() });

export const GET = route({ access: 'catalog.read', query }, async ({ query: q }) => ({ binCounts: await listBinCounts(q) }));
