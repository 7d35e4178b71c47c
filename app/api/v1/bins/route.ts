import { createdOnce, idempotencyKeyOf } from '@/server/http/idempotency-key';
import { route } from '@/server/http/route';
import { createBinSchema, listBinsSchema } from '@/lib/contracts/bins';
import { createBin } from '@/server/services/bins/create-bin';
import { listBins } from '@/server/services/bins/list-bins';

export const GET = route({ access: 'catalog.read', query: listBinsSchema }, async ({ query }) => listBins(query));

export const POST = route({ access: 'bins.edit', body: createBinSchema }, async ({ req, body, user }) => {
  const { bin, replayed } = await createBin({ input: body, by: user, idempotencyKey: idempotencyKeyOf(req, { required: false }) });
  return createdOnce({ bin }, replayed);
});
