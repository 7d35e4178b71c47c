import { createdOnce, idempotencyKeyOf } from '@/server/http/idempotency-key';
import { route } from '@/server/http/route';
import { listCountsSchema, recordCountSchema } from '@/lib/contracts/counts';
import { listCounts } from '@/server/services/counting/list-counts';
import { recordCount } from '@/server/services/counting/record-count';

export const GET = route({ access: 'catalog.read', query: listCountsSchema }, async ({ query }) => listCounts(query));

// A retry with the same Idempotency-Key gets the same status and body; a header says it was a replay.
export const POST = route({ access: 'counts.capture', body: recordCountSchema }, async ({ req, body, user }) => {
  const key = idempotencyKeyOf(req, { required: true })!;
  const { count, line, binCount, replayed } = await recordCount({ idempotencyKey: key, input: body, by: user });
  return createdOnce({ count, line, binCount }, replayed);
});
