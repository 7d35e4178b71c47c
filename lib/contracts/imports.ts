import { z } from 'zod';
import { requiredText } from './common';

// 5 MB of CSV, JSON-escaped (quotes and newlines take two characters): 10 MiB, which is also what
// Next.js buffers of a request for its proxy (experimental.proxyClientMaxBodySize, default 10 MB).
export const IMPORT_BODY_LIMIT = 10 * 1024 * 1024;

// Body of every CSV import: the file's text, and whether to write it (false = preview only).
export const importCsvSchema = z.object({
  csv: requiredText('CSV text').max(5_000_000, { error: 'At most 5 MB of CSV per import' }),
  commit: z.boolean({ error: 'commit must be true or false' }).default(false),
});
export type ImportCsvInput = z.infer<typeof importCsvSchema>;

// One row of the file as the server read it, with its own field messages (empty when fine).
export interface ImportRowBase {
  line: number;
  errors: Record<string, string>;
}

export interface ImportResult<Row extends ImportRowBase> {
  rows: Row[];
  valid: boolean;
  committed: boolean;
}
