import 'server-only';
import { stringify } from 'csv-stringify/sync';
import { safeCell } from '@/lib/csv-safe';

// A table as a CSV download: every text cell neutralised against formula injection, never cached.
export function csvResponse(header: readonly string[], rows: readonly (readonly unknown[])[], filename: string): Response {
  return new Response(stringify([[...header], ...rows.map((r) => r.map(safeCell))]), {
    headers: { 'Content-Type': 'text/csv; charset=utf-8', 'Content-Disposition': `attachment; filename="${filename}"`, 'Cache-Control': 'no-store' },
  });
}
