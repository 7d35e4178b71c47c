import { created, route } from '@/server/http/route';
import { createKitSchema } from '@/server/schemas/kits';
import { createKit } from '@/server/services/kits/create-kit';
import { listKits } from '@/server/services/kits/list-kits';

export const GET = route({ access: 'catalog.read' }, async () => ({ kits: await listKits() }));

export const POST = route({ access: 'kits.edit', body: createKitSchema }, async ({ body }) => created({ kit: await createKit({ input: body }) }));
