// Starts the local SMTP sink, the IPP printer fake and one production app server (scripts/serve.ts) against the test database,
// and hands their addresses to the tests. `npm test` has already migrated and built.
import type { ChildProcess } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { startIppPrinter, type IppPrinterFake } from '../../scripts/fakes/ipp-printer';
import { startSmtpSink, type SmtpSink } from '../../scripts/fakes/smtp-sink';
import { startApp } from '../../scripts/next-start';
import './test-env';

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
  // TZ=UTC: the server's zone, and so the site's default, is UTC in tests (helpers/days.ts counts
  // UTC days); tests of other zones set the site's own.
  // The tests stand in for a reverse proxy on loopback, so their X-Forwarded-For names the client.
  const appEnv = { SMTP_HOST: '127.0.0.1', SMTP_PORT: String(sink.port), PRINTER_URL: printer.url, TF_JOBS: '0', TZ: 'UTC', TRUSTED_PROXIES: '127.0.0.1' };
  const started = await startApp(appEnv, 'test-results');
  app = started.child;
  project.provide('baseUrl', started.url);
  project.provide('appEnv', appEnv);
  project.provide('mailDir', mailDir);
  project.provide('printDir', printDir);
  project.provide('printerUrl', printer.url);
}

export async function teardown(): Promise<void> {
  app?.kill('SIGTERM');
  await sink?.close();
  await printer?.close();
}
