// Starts the local SMTP sink, the IPP printer fake and one production `next start` against the test database,
// and hands their addresses to the tests. `npm test` has already migrated and built.
import { spawn, type ChildProcess } from 'node:child_process';
import { createWriteStream, mkdirSync, mkdtempSync } from 'node:fs';
import { createServer } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { startIppPrinter, type IppPrinterFake } from '../../scripts/fakes/ipp-printer';
import { startSmtpSink, type SmtpSink } from '../../scripts/fakes/smtp-sink';
import './test-env';

const root = path.resolve(__dirname, '../..');

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const port = (srv.address() as { port: number }).port;
      srv.close(() => resolve(port));
    });
  });
}

export async function startApp(env: Record<string, string>): Promise<{ url: string; child: ChildProcess }> {
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const child = spawn(path.join(root, 'node_modules/.bin/next'), ['start', '-p', String(port), '-H', '127.0.0.1'], {
    cwd: root,
    env: { ...process.env, APP_URL: url, ...env, PORT: String(port) },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  // The app's own log goes to test-results/ for reading after a failure.
  mkdirSync(path.join(root, 'test-results'), { recursive: true });
  const log = createWriteStream(path.join(root, 'test-results', `app-${port}.log`));
  let output = '';
  const keep = (d: Buffer) => {
    log.write(d);
    if (output.length < 20_000) output += d;
  };
  child.stdout?.on('data', keep);
  child.stderr?.on('data', keep);
  for (let i = 0; i < 200; i++) {
    if (child.exitCode !== null) throw new Error(`next start exited early:\n${output}`);
    try {
      const res = await fetch(`${url}/api/v1/health`);
      if (res.ok) return { url, child };
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 150));
  }
  child.kill('SIGKILL');
  throw new Error(`next start did not answer in time:\n${output}`);
}

let sink: SmtpSink | undefined;
let printer: IppPrinterFake | undefined;
let app: ChildProcess | undefined;

export async function setup(project: TestProject): Promise<void> {
  if (!process.env.DB_PASSWORD) throw new Error('Run the API and browser tests through `npm test` (it starts the test database).');
  const mailDir = mkdtempSync(path.join(os.tmpdir(), 'tallyforge-mail-'));
  sink = await startSmtpSink({ port: 0, dir: mailDir });
  process.env.SMTP_PORT = String(sink.port);
  // Scheduled jobs run when a test asks (POST /api/v1/jobs/...), not by the clock.
  const printDir = mkdtempSync(path.join(os.tmpdir(), 'tallyforge-printed-'));
  printer = await startIppPrinter({ port: 0, dir: printDir });
  const started = await startApp({ SMTP_HOST: '127.0.0.1', SMTP_PORT: String(sink.port), PRINTER_URL: printer.url, TF_JOBS: '0' });
  app = started.child;
  project.provide('baseUrl', started.url);
  project.provide('mailDir', mailDir);
  project.provide('printDir', printDir);
  project.provide('printerUrl', printer.url);
}

export async function teardown(): Promise<void> {
  app?.kill('SIGTERM');
  await sink?.close();
  await printer?.close();
}
