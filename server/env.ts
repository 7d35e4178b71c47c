import 'server-only';
import { z } from 'zod';

// The one parse of the process environment. Scripts and the app both read it through here.
const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('production'),
  DB_HOST: z.string().default('127.0.0.1'),
  DB_PORT: z.coerce.number().int().positive().default(3307),
  DB_NAME: z.string().min(1).default('tallyforge'),
  DB_USER: z.string().min(1).default('tallyforge'),
  DB_PASSWORD: z.string().min(1, 'DB_PASSWORD is required (npm start generates one)'),
  DB_POOL_MAX: z.coerce.number().int().positive().default(10),
  SESSION_SECRET: z.string().min(32, 'SESSION_SECRET must be at least 32 characters'),
  // Set when the app is reached over https (directly or behind a proxy): cookies get Secure.
  SECURE_COOKIES: z.enum(['0', '1']).default('0'),
  APP_URL: z.string().url().default('http://localhost:3000'),
  // Reverse proxies whose X-Forwarded-For is believed: addresses or CIDR ranges, comma-separated.
  // Empty: the address a request came from is the socket's, whatever headers it carries.
  TRUSTED_PROXIES: z
    .string()
    .default('')
    .transform((v) =>
      v
        .split(',')
        .map((s) => s.trim())
        .filter(Boolean),
    ),
  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().positive().default(2525),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  // Uploaded files (part photos, test-weight certificates) live here, outside the web root.
  UPLOAD_DIR: z.string().default('.data/dev/uploads'),
  MAIL_FROM: z.string().default('Tallyforge <tallyforge@localhost>'),
  // Label renders waiting for a worker thread before more are refused with 503.
  LABEL_QUEUE_LIMIT: z.coerce.number().int().positive().default(16),
  // The label printer (IPP; ipps for TLS). The default is the local printer fake that npm start runs.
  PRINTER_URL: z
    .string()
    .regex(/^ipps?:\/\/[^/]+\/\S*$/, 'PRINTER_URL must be an ipp:// or ipps:// printer URL')
    .default('ipp://127.0.0.1:8631/printers/labels'),
});

export type Env = z.infer<typeof envSchema>;

let cached: Env | undefined;

export function getEnv(): Env {
  if (!cached) {
    const parsed = envSchema.safeParse(process.env);
    if (!parsed.success) {
      const lines = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
      throw new Error(`Invalid environment:\n${lines.join('\n')}`);
    }
    cached = parsed.data;
  }
  return cached;
}
