import { z } from 'zod';
import { route } from '@/server/http/route';
import { recordIdSchema } from '@/lib/contracts/common';
import { listBinCounts } from '@/server/services/bins/list-bin-counts';

const query = z.object({ status: z.enum(['applied', 'pending', 'approved', 'rejected']).optional(), binId: recordIdSchema.optional() });

export const GET = route({ access: 'catalog.read', query }, async ({ query: q }) => ({ binCounts: await listBinCounts(q) }));
