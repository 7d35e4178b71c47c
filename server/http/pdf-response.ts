import 'server-only';

// Generated files answer as a plain Response with their type and a file name; inline, so a browser
// shows the labels and prints them from its PDF viewer.
export function pdfResponse(pdf: Uint8Array, filename: string): Response {
  return new Response(Buffer.from(pdf), {
    headers: {
      'Content-Type': 'application/pdf',
      'Content-Disposition': `inline; filename="${filename}"`,
      'Content-Length': String(pdf.length),
      'Cache-Control': 'private, no-store',
    },
  });
}
