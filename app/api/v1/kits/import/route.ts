import { route } from '@/server/http/route';
import { IMPORT_BODY_LIMIT, importCsvSchema } from '@/lib/contracts/imports';
import { importBoms } from '@/server/services/kits/import-boms';

export const POST = route({ access: 'kits.edit', body: importCsvSchema, maxBodyBytes: IMPORT_BODY_LIMIT }, async ({ body }) => importBoms({ input: body }));
