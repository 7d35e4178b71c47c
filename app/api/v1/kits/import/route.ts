import { route } from '@/server/http/route';
import { importCsvSchema } from '@/server/schemas/imports';
import { importBoms } from '@/server/services/kits/import-boms';

export const POST = route({ access: 'kits.edit', body: importCsvSchema }, async ({ body }) => importBoms({ input: body }));
