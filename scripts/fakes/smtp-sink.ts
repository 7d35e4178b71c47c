// A local SMTP sink on loopback: accepts every message and keeps it as JSON in a folder,
// so dev users and tests can read what the app sent. Never relays anywhere.
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

export interface SunkMail {
  to: string[];
  from: string;
  subject: string;
  text: string;
  receivedAt: string;
}

export interface SmtpSink {
  port: number;
  dir: string;
  close: () => Promise<void>;
}

export async function startSmtpSink({ port, dir, host = '127.0.0.1' }: { port: number; dir: string; host?: string }): Promise<SmtpSink> {
  mkdirSync(dir, { recursive: true });
  let seq = 0;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    size: 10 * 1024 * 1024,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const mail: SunkMail = {
            to: session.envelope.rcptTo.map((r) => r.address),
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            receivedAt: new Date().toISOString(),
          };
          const name = `${Date.now()}-${process.pid}-${++seq}.json`;
          writeFileSync(path.join(dir, name), JSON.stringify(mail, null, 2));
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => resolve());
  });
  const actual = (server.server.address() as AddressInfo).port;
  return { port: actual, dir, close: () => new Promise((resolve) => server.close(() => resolve())) };
}
