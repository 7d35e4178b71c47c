import { z } from 'zod';
import { route } from '@/server/http/route';
import { recordHandCountSchema } from '@/lib/contracts/audits';
import { recordIdSchema } from '@/lib/contracts/common';
import { recordHandCount } from '@/server/services/audits/record-hand-count';

const params = z.object({ id: recordIdSchema, itemId: recordIdSchema });

// PUT: keying the same hand count twice leaves the same state.
export const PUT = route({ access: 'audits.run', params, body: recordHandCountSchema }, async ({ params: p, body, user }) => ({
  audit: await recordHandCount({ auditId: p.id, itemId: p.itemId, handCount: body.handCount, by: user }),
}));
