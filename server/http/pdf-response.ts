import 'server-only';
import { toCodePointList, UNPRINTABLE_HEADER } from '@/lib/unprintable';

// Generated files answer as a plain Response with their type and a file name; inline, so a browser
// shows the labels and prints them from its PDF viewer. Characters the labels could not print are named
// in a header, so the page that asked can say so.
export function pdfResponse(pdf: Uint8Array, filename: string, unprintable: readonly string[] = []): Response {
  const headers = new Headers({
    'Content-Type': 'application/pdf',
    'Content-Disposition': `inline; filename="${filename}"`,
    'Content-Length': String(pdf.length),
    'Cache-Control': 'private, no-store',
  });
  if (unprintable.length) headers.set(UNPRINTABLE_HEADER, toCodePointList(unprintable));
  return new Response(Buffer.from(pdf), { headers });
}
