import 'server-only';
import { getEnv } from '../env';

// The configured printer, or another queue on the same print server (…/printers/<queue>).
export function printerUrlFor(queue?: string): string {
  const base = getEnv().PRINTER_URL;
  if (!queue) return base;
  const url = new URL(base);
  url.pathname = url.pathname.replace(/[^/]*$/, encodeURIComponent(queue));
  return url.href;
}
