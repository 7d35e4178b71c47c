import { z } from 'zod';
import { LINE_PROFILES } from '@/lib/scale/line-format';

const profileNames = LINE_PROFILES.map((p) => p.name) as [string, ...string[]];

// How a bench reaches this scale. A workstation may keep its own copy (port choice) in the browser.
export const scaleConnectionSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({
      kind: z.literal('simulator'),
      settleMs: z.number().int().min(0).max(10_000).default(250),
      driftPerMinute: z.number().min(0).max(10).default(0),
      rateHz: z.number().int().min(1).max(100).default(20),
    }),
    z.object({
      kind: z.literal('serial'),
      baudRate: z.union(
        [1200, 2400, 4800, 9600, 19200, 38400, 57600, 115200].map((b) => z.literal(b)) as [
          z.ZodLiteral<number>,
          z.ZodLiteral<number>,
          ...z.ZodLiteral<number>[],
        ],
        {
          error: 'Baud rate must be a standard rate from 1200 to 115200',
        },
      ),
      dataBits: z.union([z.literal(7), z.literal(8)]).default(8),
      parity: z.enum(['none', 'even', 'odd']).default('none'),
      stopBits: z.union([z.literal(1), z.literal(2)]).default(1),
      lineFormat: z.enum(profileNames, { error: `Line format must be one of ${profileNames.join(', ')}` }),
      mode: z.enum(['continuous', 'polled']).default('continuous'),
      // Sent each poll; \r and \n escapes are allowed.
      pollRequest: z
        .string()
        .max(16)
        .regex(/^[\x20-\x7e]*$/, { error: 'Printable ASCII only (use \\r, \\n for line ends)' })
        .optional(),
      pollIntervalMs: z.number().int().min(50).max(5_000).default(200),
    }),
    z.object({
      kind: z.literal('raw_adc'),
      bits: z.number().int().min(8).max(32),
      fullScaleVolts: z.number().gt(0).max(50),
      gain: z.number().gt(0).max(10_000),
      reversedExcitation: z.boolean().default(false),
      averaging: z.number().int().min(1).max(256).default(1),
    }),
    z.object({ kind: z.literal('keyed') }),
  ],
  { error: 'connection.kind must be simulator, serial, raw_adc or keyed' },
);
export type ScaleConnection = z.infer<typeof scaleConnectionSchema>;
