import { route } from '@/server/http/route';
import { importCsvSchema } from '@/server/schemas/imports';
import { importParts } from '@/server/services/parts/import-parts';

export const POST = route({ access: 'parts.edit', body: importCsvSchema }, async ({ body }) => importParts({ input: body }));
