import { z } from 'zod';
import { AQLS, type Aql } from '@/lib/sampling/iso2859';
import { COUNT_PURPOSES, type CountPurpose } from '@/lib/domain/counting';
import { wholeCount } from './weights';

const levelSchema = z.enum(['I', 'II', 'III'], { error: 'Inspection level must be I, II or III' });
const aqlSchema = z.coerce
  .number({ error: 'AQL must be a number' })
  .refine((v): v is Aql => (AQLS as readonly number[]).includes(v), { error: `AQL must be one of ${AQLS.join(', ')}` });

export const samplingPlanQuerySchema = z.object({
  lotSize: z.coerce
    .number({ error: 'lotSize must be a number' })
    .int({ error: 'lotSize must be a whole number' })
    .min(2, { error: 'A lot has at least 2 items' })
    .max(100_000_000),
  level: levelSchema.default('II'),
  aql: aqlSchema,
});

export const populationSchema = z
  .object({
    from: z.iso.date({ error: 'from must be a date (YYYY-MM-DD)' }),
    to: z.iso.date({ error: 'to must be a date (YYYY-MM-DD)' }),
    partId: wholeCount('Part').optional(),
    operatorId: wholeCount('Operator').optional(),
    scaleId: wholeCount('Scale').optional(),
    purpose: z.enum(COUNT_PURPOSES as unknown as [CountPurpose, ...CountPurpose[]]).optional(),
  })
  .refine((p) => p.from <= p.to, { error: 'from must not be after to', path: ['to'] });
export type Population = z.infer<typeof populationSchema>;

export const createAuditSchema = z.object({
  population: populationSchema,
  level: levelSchema.default('II'),
  aql: aqlSchema,
  // Recorded so the selection can be repeated; a random one is drawn when absent.
  seed: z
    .number()
    .int()
    .min(1)
    .max(2 ** 31 - 1)
    .optional(),
});
export type CreateAuditInput = z.infer<typeof createAuditSchema>;

export const recordHandCountSchema = z.object({ handCount: wholeCount('Hand count', 0) });

export interface AuditItemDto {
  id: number;
  countEventId: number;
  partId: number;
  partNumber: string;
  scaleId: number;
  operatorId: number;
  countedAt: string;
  count: number;
  expandedUncertainty: number;
  wholePieceRange: number;
  exact: boolean;
  handCount: number | null;
  error: number | null;
  withinUncertainty: boolean | null;
  exactRight: boolean | null;
}

export interface AuditDto {
  id: number;
  population: Population;
  lotSize: number;
  level: 'I' | 'II' | 'III';
  aql: number;
  codeLetter: string;
  sampleSize: number;
  accept: number;
  reject: number;
  seed: number;
  status: 'open' | 'closed';
  defects: number | null;
  verdict: 'accepted' | 'rejected' | null;
  items: AuditItemDto[];
  createdAt: string;
}
