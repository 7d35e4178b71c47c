import 'server-only';
import pino from 'pino';

// One structured logger for the server: JSON lines on stdout, ready for any log shipper.
export const log = pino({ level: process.env.LOG_LEVEL ?? 'info', base: { app: 'tallyforge' } });
