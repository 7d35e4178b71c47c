import 'server-only';
import nodemailer, { type Transporter } from 'nodemailer';
import { getEnv } from '../env';

let transport: Transporter | undefined;

// Plain SMTP to the configured relay; in dev and tests that is the local sink on loopback.
export function getTransport(): Transporter {
  if (!transport) {
    const env = getEnv();
    transport = nodemailer.createTransport({
      host: env.SMTP_HOST,
      port: env.SMTP_PORT,
      secure: false,
      ignoreTLS: env.SMTP_HOST === '127.0.0.1' || env.SMTP_HOST === 'localhost',
      auth: env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASSWORD ?? '' } : undefined,
      connectionTimeout: 5_000,
      greetingTimeout: 5_000,
      socketTimeout: 10_000,
    });
  }
  return transport;
}
