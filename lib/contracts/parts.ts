import { z } from 'zod';
import type { SpreadBelief } from '@/lib/weighing/spread-belief';
import { COUNTING_METHODS, type CountingMethod, type SampleStatus } from '@/lib/domain/counting';
import { pagingSchema, recordIdSchema, requiredText, versionSchema } from './common';
import { positiveNumber, unitSchema, weightReading, wholeCount } from './weights';

// Part numbers: letters, digits and . _ - / ; stored upper-case so scans match however typed.
export const partNumberSchema = requiredText('Part number')
  .trim()
  .toUpperCase()
  .regex(/^[A-Z0-9][A-Z0-9._\-/]{0,39}$/, { error: 'Letters, digits and . _ - / only, at most 40 characters' });

const methodSchema = z.enum(COUNTING_METHODS as unknown as [CountingMethod, ...CountingMethod[]], { error: 'Counting method must be scale or hand' });

export const createPartSchema = z.object({
  partNumber: partNumberSchema,
  description: requiredText('Description').trim().min(1, { error: 'Description is required' }).max(200),
  countingMethod: methodSchema.default('scale'),
});
export type CreatePartInput = z.infer<typeof createPartSchema>;

export const updatePartSchema = z.object({
  description: createPartSchema.shape.description.optional(),
  countingMethod: methodSchema.optional(),
  version: versionSchema,
});
export type UpdatePartInput = z.infer<typeof updatePartSchema>;

export const listPartsSchema = pagingSchema.extend({
  q: z.string().trim().max(80).optional(),
  sort: z.enum(['partNumber', 'description', 'updatedAt']).default('partNumber'),
  dir: z.enum(['asc', 'desc']).default('asc'),
});
export type ListPartsQuery = z.infer<typeof listPartsSchema>;

export const recordSampleSchema = z.object({
  scaleId: wholeCount('Scale'),
  unit: unitSchema.default('g'),
  quantity: wholeCount('Sample quantity'),
  netWeight: positiveNumber('Sample net weight'),
  // One stable increment per piece when the sample was built piece by piece, in `unit`.
  // A piece near the division may leave the reading unchanged (0) or, with noise, lower it.
  increments: z.array(weightReading('Each increment'), { error: 'increments must be a list of weights' }).max(10_000).optional(),
});
export type RecordSampleInput = z.infer<typeof recordSampleSchema>;

export const sampleDecisionSchema = z.object({
  decision: z.enum(['accept', 'reject'], { error: 'Decision must be accept or reject' }),
});
export type SampleDecisionInput = z.infer<typeof sampleDecisionSchema>;
export const sampleDecisionParamsSchema = z.object({ id: recordIdSchema, sampleId: recordIdSchema });

export interface PartDto {
  id: number;
  partNumber: string;
  description: string;
  countingMethod: CountingMethod;
  unit: 'g';
  averagePieceWeight: number | null;
  apwSampleSize: number | null;
  pieceSpread: number | null;
  spreadLearned: boolean;
  spreadObservations: number;
  /** Degrees of freedom of the learned spread; null until learned. */
  spreadDegreesOfFreedom: number | null;
  /** The learned spread as the counting core takes it; null until learned. */
  spreadBelief: SpreadBelief | null;
  hasPhoto: boolean;
  version: number;
  updatedAt: string;
}

export interface SampleDto {
  id: number;
  partId: number;
  scaleId: number;
  unit: 'g';
  quantity: number;
  netWeight: number;
  averagePieceWeight: number;
  pieceByPiece: boolean;
  /** held: far from the part's history, waiting for quality or a planner; it teaches the part nothing until accepted. */
  status: SampleStatus;
  holdReason: string | null;
  decidedBy: number | null;
  decidedAt: string | null;
  createdBy: number;
  createdAt: string;
}

export const exportPartsSchema = listPartsSchema.pick({ q: true, sort: true, dir: true });
export type ExportPartsQuery = z.infer<typeof exportPartsSchema>;

export const PART_CSV_COLUMNS = ['part_number', 'description', 'counting_method'] as const;

export interface PartImportRow {
  line: number;
  partNumber: string;
  description: string;
  countingMethod: string;
  // A part number that already exists updates that part; a new one creates it.
  action: 'create' | 'update';
  errors: Record<string, string>;
}

export interface HeldSample {
  id: number;
  partId: number;
  partNumber: string;
  /** The part's APW now (g), which accepting would replace. */
  partApw: number | null;
  quantity: number;
  averagePieceWeight: number;
  holdReason: string;
  scaleName: string;
  takenBy: string;
  takenAt: string;
}
