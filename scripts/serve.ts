// The app's HTTP server in production: Next.js's own request handler behind a plain Node server, so that
// every request carries the address of the socket it came in on. Next keeps a client's X-Forwarded-For
// as sent, which would let anyone choose the address the sign-in limits count against.
// Run with `node --import tsx scripts/serve.ts`; PORT and HOST as for `next start`, APP_PROCESSES for how
// many processes serve the port (serve-processes.ts).
import cluster from 'node:cluster';
import http from 'node:http';
import os from 'node:os';
import path from 'node:path';
import next from 'next';
import { appProcesses } from '../lib/app-processes';
import { PEER_HEADER } from '../lib/internal-headers';
import { isWellFormedPath } from '../lib/well-formed-text';
import { watchDatabase } from '../server/http/database-watch';
import { UNAVAILABLE_CSP, UNAVAILABLE_RETRY_S, unavailablePage } from '../server/http/unavailable-page';
import { runProcesses } from './serve-processes';

const port = Number(process.env.PORT ?? 3000);
const hostname = process.env.HOST ?? '127.0.0.1';
// instrumentation.ts reads it: serving beyond loopback is refused while demo passwords are known.
process.env.HOST = hostname;
// How long a stop waits for requests in flight before it exits anyway.
const STOP_GRACE_MS = 30_000;

async function main(): Promise<void> {
  const app = next({ dev: false, dir: path.resolve(__dirname, '..'), hostname, port });
  await app.prepare();
  const handle = app.getRequestHandler();
  const ownAddress = hostname === '0.0.0.0' || hostname === '::' ? '127.0.0.1' : hostname;
  const database = watchDatabase(`http://${ownAddress.includes(':') ? `[${ownAddress}]` : ownAddress}:${port}/api/v1/health`);
  const server = http.createServer((req, res) => {
    req.headers[PEER_HEADER] = req.socket.remoteAddress ?? '';
    if (isMalformedApiAddress(req.url ?? '/')) return refuseMalformedAddress(res);
    if (database.isDown() && isPageRequest(req)) return answerUnavailable(res);
    void handle(req, res);
  });
  server.listen(port, hostname, () => console.log(`Tallyforge serving on http://${hostname}:${port}`));

  // Stop as `next start` does: take no new connections, let requests in flight finish, then exit with the
  // signal's code. Kept-alive connections are closed as soon as they fall idle.
  let stopping = false;
  const stop = (code: number) => {
    // A terminal's Ctrl-C reaches every process of the group, and the primary passes a stop on as well.
    if (stopping) return;
    stopping = true;
    database.stop();
    const idle = setInterval(() => server.closeIdleConnections(), 100);
    server.close(() => {
      clearInterval(idle);
      process.exit(code);
    });
    setTimeout(() => process.exit(code), STOP_GRACE_MS).unref();
  };
  process.once('SIGTERM', () => stop(143));
  process.once('SIGINT', () => stop(130));
}

// Next's router fails decoding such a path before any handler runs and answers a bare text 500; API
// callers get the JSON error shape instead. (Pages are left to Next.)
function isMalformedApiAddress(url: string): boolean {
  const pathname = url.split('?', 1)[0];
  return pathname.startsWith('/api/') && !isWellFormedPath(pathname);
}

function refuseMalformedAddress(res: http.ServerResponse): void {
  const body = JSON.stringify({ error: { code: 'bad_request', message: 'The address is not valid (bad percent-encoding)' } });
  res.writeHead(400, { 'Content-Type': 'application/json', 'Cache-Control': 'no-store', 'Content-Length': Buffer.byteLength(body) });
  res.end(body);
}

// A page (not the API, which answers its own JSON 503, nor the built assets) asked for by a browser.
function isPageRequest(req: http.IncomingMessage): boolean {
  const pathname = (req.url ?? '/').split('?', 1)[0];
  return (req.method === 'GET' || req.method === 'HEAD') && !pathname.startsWith('/api/') && !pathname.startsWith('/_next/') && !/\.\w+$/.test(pathname);
}

function answerUnavailable(res: http.ServerResponse): void {
  const body = unavailablePage();
  res.writeHead(503, {
    'Content-Type': 'text/html; charset=utf-8',
    'Content-Length': Buffer.byteLength(body),
    'Retry-After': String(UNAVAILABLE_RETRY_S),
    'Cache-Control': 'no-store',
    'Content-Security-Policy': UNAVAILABLE_CSP,
    'X-Content-Type-Options': 'nosniff',
  });
  res.end(body);
}

const setting = appProcesses(process.env.APP_PROCESSES, os.availableParallelism());
if ('error' in setting) {
  console.error(setting.error);
  process.exit(1);
} else if (cluster.isPrimary && setting.processes > 1) {
  runProcesses(setting.processes, STOP_GRACE_MS);
} else {
  main().catch((err) => {
    console.error(err);
    process.exit(1);
  });
}
