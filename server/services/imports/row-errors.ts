import 'server-only';
import type { z } from 'zod';

// Maps a zod failure on one CSV row to {column: message}, using the file's column names.
export function rowErrors(error: z.ZodError, columnOf: Record<string, string>): Record<string, string> {
  const errors: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = columnOf[String(issue.path[0] ?? '')] ?? String(issue.path[0] ?? 'row');
    errors[key] ??= issue.message;
  }
  return errors;
}
