import { createdOnce, idempotencyKeyOf } from '@/server/http/idempotency-key';
import { route } from '@/server/http/route';
import { createKitSchema } from '@/lib/contracts/kits';
import { createKit } from '@/server/services/kits/create-kit';
import { listKits } from '@/server/services/kits/list-kits';

export const GET = route({ access: 'catalog.read' }, async () => ({ kits: await listKits() }));

export const POST = route({ access: 'kits.edit', body: createKitSchema }, async ({ req, body, user }) => {
  const { kit, replayed } = await createKit({ input: body, by: user, idempotencyKey: idempotencyKeyOf(req, { required: false }) });
  return createdOnce({ kit }, replayed);
});
