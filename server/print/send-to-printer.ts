import 'server-only';
import ipp from 'ipp';

export interface SentJob {
  printerJobId: number | null;
}

export class PrinterError extends Error {}

// Print-Job over IPP (RFC 8011 §4.2.1): the PDF goes as the document, after the operation attributes.
// ipp:// is HTTP on port 631 unless the URL names another (RFC 3510); ipps:// is HTTPS.
export async function sendToPrinter({
  printerUrl,
  pdf,
  jobName,
  userName,
  timeoutMs = 20_000,
}: {
  printerUrl: string;
  pdf: Uint8Array;
  jobName: string;
  userName: string;
  timeoutMs?: number;
}): Promise<SentJob> {
  const url = new URL(printerUrl);
  const http = new URL(url.href.replace(/^ipp(s?):/, 'http$1:'));
  if (!url.port) http.port = '631';
  const message = ipp.serialize({
    version: '2.0',
    operation: 'Print-Job',
    'operation-attributes-tag': {
      'attributes-charset': 'utf-8',
      'attributes-natural-language': 'en-us',
      'printer-uri': printerUrl,
      'requesting-user-name': userName,
      'job-name': jobName,
      'document-format': 'application/pdf',
    },
    data: Buffer.from(pdf),
  });
  let res: Response;
  try {
    res = await fetch(http, {
      method: 'POST',
      headers: { 'Content-Type': 'application/ipp' },
      body: new Uint8Array(message),
      signal: AbortSignal.timeout(timeoutMs),
    });
  } catch (err) {
    throw new PrinterError(
      `printer at ${url.host} did not answer: ${err instanceof Error ? (err.cause instanceof Error ? err.cause.message : err.message) : String(err)}`,
    );
  }
  if (!res.ok) throw new PrinterError(`printer at ${url.host} answered HTTP ${res.status}`);
  const answer = ipp.parse(Buffer.from(await res.arrayBuffer()));
  if (!answer.statusCode?.startsWith('successful')) throw new PrinterError(`printer refused the job: ${answer.statusCode ?? 'no status'}`);
  const jobId = answer['job-attributes-tag']?.['job-id'];
  return { printerJobId: typeof jobId === 'number' ? jobId : null };
}
