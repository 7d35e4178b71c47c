import 'server-only';
import { parse } from 'csv-parse/sync';
import { AppError } from '../../errors';

export interface CsvRecord {
  line: number;
  values: Record<string, string>;
}

const MAX_ROWS = 20_000;

// Reads a CSV with a header row into records keyed by column name (lower-case, trimmed), each
// with the file line it came from. A file that cannot be read at all is one 400 on `csv`.
export function readCsvRecords(csv: string, required: readonly string[], optional: readonly string[] = []): CsvRecord[] {
  let parsed: Array<{ record: string[]; info: { lines: number } }>;
  try {
    parsed = parse(csv, { bom: true, info: true, skip_empty_lines: true, trim: true, relax_column_count: true }) as never;
  } catch (err) {
    throw new AppError('validation_failed', 'The file is not readable CSV', { fields: { csv: err instanceof Error ? err.message : 'not CSV' } });
  }
  if (!parsed.length) throw new AppError('validation_failed', 'The file is empty', { fields: { csv: 'needs a header row and at least one row' } });
  const header = parsed[0].record.map((h) => h.trim().toLowerCase());
  const missing = required.filter((c) => !header.includes(c));
  if (missing.length) throw new AppError('validation_failed', 'Some columns are missing', { fields: { csv: `missing column(s): ${missing.join(', ')}` } });
  const known = new Set([...required, ...optional]);
  const unknown = header.filter((h) => !known.has(h));
  if (unknown.length) throw new AppError('validation_failed', 'Some columns are not known', { fields: { csv: `unknown column(s): ${unknown.join(', ')}` } });
  const rows = parsed.slice(1);
  if (!rows.length) throw new AppError('validation_failed', 'The file has no rows', { fields: { csv: 'needs at least one row under the header' } });
  if (rows.length > MAX_ROWS) throw new AppError('validation_failed', 'The file is too long', { fields: { csv: `at most ${MAX_ROWS} rows per import` } });
  return rows.map(({ record, info }) => ({
    line: info.lines,
    values: Object.fromEntries(header.map((h, i) => [h, record[i] ?? ''])),
  }));
}
