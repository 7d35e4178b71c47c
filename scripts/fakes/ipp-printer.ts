// A local IPP printer on loopback for dev and tests: answers Get-Printer-Attributes and accepts Print-Job
// (PDF only), keeping each document as NNNN.pdf with its job attributes in NNNN.json. Never prints.
import { mkdirSync, writeFileSync } from 'node:fs';
import { createServer, type IncomingMessage } from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import ipp, { type IppMessage } from 'ipp';

export interface PrintedJob {
  jobId: number;
  queue: string;
  jobName: string;
  userName: string;
  documentFormat: string;
  bytes: number;
  receivedAt: string;
}

export interface IppPrinterFake {
  port: number;
  url: string; // of the first queue
  dir: string;
  close: () => Promise<void>;
}

// Where the document starts: after the end-of-attributes tag (RFC 8010 §3.1). The ipp package's parser
// hands the document back as UTF-8 text, which would mangle a PDF, so the attributes are walked here.
export function documentOffset(message: Buffer): number {
  let at = 8; // version (2), operation or status (2), request id (4)
  while (at < message.length) {
    const tag = message[at++];
    if (tag === 0x03) return at;
    if (tag < 0x10) continue; // a group delimiter
    const nameLength = message.readUInt16BE(at);
    const valueLength = message.readUInt16BE(at + 2 + nameLength);
    at += 2 + nameLength + 2 + valueLength;
  }
  throw new Error('no end-of-attributes tag');
}

function reply(request: IppMessage, statusCode: string, groups: Partial<IppMessage> = {}): Buffer {
  return ipp.serialize({
    version: '2.0',
    statusCode,
    id: request.id,
    'operation-attributes-tag': { 'attributes-charset': 'utf-8', 'attributes-natural-language': 'en-us' },
    ...groups,
  });
}

export async function startIppPrinter({
  port,
  dir,
  host = '127.0.0.1',
  queues = ['labels'],
}: {
  port: number;
  dir: string;
  host?: string;
  queues?: string[];
}): Promise<IppPrinterFake> {
  mkdirSync(dir, { recursive: true });
  let nextJobId = 1;
  const handle = (req: IncomingMessage, body: Buffer): Buffer => {
    const request = ipp.parse(body.subarray(0, documentOffset(body)));
    const queue = (req.url ?? '').replace(/^\/printers\//, '');
    if (!queues.includes(queue)) return reply(request, 'client-error-not-found');
    const attributes = request['operation-attributes-tag'] ?? {};
    if (request.operation === 'Get-Printer-Attributes') {
      return reply(request, 'successful-ok', {
        'printer-attributes-tag': {
          'printer-uri-supported': `ipp://${host}:${actualPort}/printers/${queue}`,
          'printer-name': queue,
          'printer-state': 'idle',
          'printer-is-accepting-jobs': true,
          'document-format-supported': ['application/pdf'],
        },
      });
    }
    if (request.operation !== 'Print-Job') return reply(request, 'server-error-operation-not-supported');
    const document = body.subarray(documentOffset(body));
    if (attributes['document-format'] !== 'application/pdf') return reply(request, 'client-error-document-format-not-supported');
    if (document.subarray(0, 5).toString('latin1') !== '%PDF-') return reply(request, 'client-error-bad-request');
    const jobId = nextJobId++;
    const name = `${String(jobId).padStart(4, '0')}-${process.pid}`;
    const job: PrintedJob = {
      jobId,
      queue,
      jobName: String(attributes['job-name'] ?? ''),
      userName: String(attributes['requesting-user-name'] ?? ''),
      documentFormat: String(attributes['document-format']),
      bytes: document.length,
      receivedAt: new Date().toISOString(),
    };
    writeFileSync(path.join(dir, `${name}.pdf`), document);
    writeFileSync(path.join(dir, `${name}.json`), JSON.stringify(job, null, 2));
    return reply(request, 'successful-ok', {
      'job-attributes-tag': { 'job-id': jobId, 'job-uri': `ipp://${host}:${actualPort}/jobs/${jobId}`, 'job-state': 'completed' },
    });
  };

  const server = createServer((req, res) => {
    if (req.method !== 'POST' || req.headers['content-type'] !== 'application/ipp') {
      res.writeHead(400).end();
      return;
    }
    const chunks: Buffer[] = [];
    req.on('data', (c: Buffer) => chunks.push(c));
    req.on('end', () => {
      try {
        const answer = handle(req, Buffer.concat(chunks));
        res.writeHead(200, { 'Content-Type': 'application/ipp' }).end(answer);
      } catch {
        res.writeHead(400).end();
      }
    });
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => resolve());
  });
  const actualPort = (server.address() as AddressInfo).port;
  return {
    port: actualPort,
    url: `ipp://${host}:${actualPort}/printers/${queues[0]}`,
    dir,
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
