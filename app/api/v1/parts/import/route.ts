import { route } from '@/server/http/route';
import { IMPORT_BODY_LIMIT, importCsvSchema } from '@/lib/contracts/imports';
import { importParts } from '@/server/services/parts/import-parts';

export const POST = route({ access: 'parts.edit', body: importCsvSchema, maxBodyBytes: IMPORT_BODY_LIMIT }, async ({ body }) => importParts({ input: body }));
