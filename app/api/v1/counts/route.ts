import { AppError } from '@/server/errors';
import { route } from '@/server/http/route';
import { idempotencyKeySchema, listCountsSchema, recordCountSchema } from '@/server/schemas/counts';
import { listCounts } from '@/server/services/counting/list-counts';
import { recordCount } from '@/server/services/counting/record-count';

export const GET = route({ access: 'catalog.read', query: listCountsSchema }, async ({ query }) => listCounts(query));

// A retry with the same Idempotency-Key gets the same status and body; a header says it was a replay.
export const POST = route({ access: 'counts.capture', body: recordCountSchema }, async ({ req, body, user }) => {
  const key = idempotencyKeySchema.safeParse(req.headers.get('idempotency-key') ?? undefined);
  if (!key.success) throw new AppError('validation_failed', key.error.issues[0].message, { fields: { 'Idempotency-Key': key.error.issues[0].message } });
  const { count, line, binCount, replayed } = await recordCount({ idempotencyKey: key.data, input: body, by: user });
  return Response.json({ count, line, binCount }, { status: 201, headers: { 'Idempotent-Replayed': String(replayed) } });
});
