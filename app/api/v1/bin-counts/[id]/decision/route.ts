import { z } from 'zod';
import { route } from '@/server/http/route';
import { idParamSchema } from '@/lib/contracts/common';
import { decideVariance } from '@/server/services/bins/decide-variance';

const body = z.object({
  decision: z.enum(['approve', 'reject'], { error: 'decision must be approve or reject' }),
  note: z.string().trim().max(200).nullish(),
});

export const POST = route({ access: 'variances.approve', params: idParamSchema, body }, async ({ params, body: b, user }) => ({
  binCount: await decideVariance({ binCountId: params.id, approve: b.decision === 'approve', note: b.note, by: user }),
}));
