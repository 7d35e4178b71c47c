import { z } from 'zod';
import { COUNT_PURPOSES, type CountPurpose } from '@/lib/domain/counting';
import type { CountingWarning } from '@/lib/weighing';
import { pagingSchema, recordIdSchema } from './common';
import { nonNegativeNumber, positiveNumber, unitSchema, weightReading, wholeCount } from './weights';

const purposeSchema = z.enum(COUNT_PURPOSES as unknown as [CountPurpose, ...CountPurpose[]], { error: `Purpose must be one of ${COUNT_PURPOSES.join(', ')}` });

// The bench sends what the scale said; the server computes the count itself.
export const recordCountSchema = z.object({
  purpose: purposeSchema,
  partId: wholeCount('Part'),
  scaleId: wholeCount('Scale'),
  // The load weighed on another scale than the sample (a platform for the bulk): gross and tare are
  // that scale's readings, and the sample stays apart.
  bulkScaleId: wholeCount('Bulk scale').nullish(),
  containerId: wholeCount('Container').nullish(),
  unit: unitSchema.default('g'),
  gross: nonNegativeNumber('Gross weight'),
  // May sit a division or so below zero (an empty pan tared after drift); the service decides.
  tare: weightReading('Tare'),
  sample: z.object(
    { quantity: wholeCount('Sample quantity'), netWeight: positiveNumber('Sample net weight') },
    { error: 'sample is required: { quantity, netWeight }' },
  ),
  sampleOnPan: z.boolean().default(true),
  targetQuantity: wholeCount('Target quantity').nullish(),
  // A kitting capture names the build-order line it fills (purpose kit_line).
  orderLineId: wholeCount('Order line').nullish(),
  // A cycle count names the bin and the bin version it started from (purpose bin).
  binId: wholeCount('Bin').nullish(),
  binVersion: z.number().int().min(0).nullish(),
  stable: z.boolean({ error: 'stable must be true or false (was the reading steady?)' }),
});
export type RecordCountInput = z.infer<typeof recordCountSchema>;

export const listCountsSchema = pagingSchema.extend({
  partId: recordIdSchema.optional(),
  scaleId: recordIdSchema.optional(),
  operatorId: recordIdSchema.optional(),
  purpose: purposeSchema.optional(),
  from: z.iso.datetime({ offset: true, error: 'from must be an ISO date-time' }).or(z.iso.date()).optional(),
  to: z.iso.datetime({ offset: true, error: 'to must be an ISO date-time' }).or(z.iso.date()).optional(),
});
export type ListCountsQuery = z.infer<typeof listCountsSchema>;

// A GET form sends every field, the unused ones empty: empty means "any".
const optionalField = <S extends z.ZodType>(schema: S) => z.preprocess((v) => (v === '' ? undefined : v), schema.optional());

// The count log's filters, as the page's form and the CSV download send them.
export const countLogQuerySchema = z.object({
  partNumber: optionalField(z.string().trim().toUpperCase().max(40, { error: 'A part number has at most 40 characters' })),
  scaleId: optionalField(recordIdSchema),
  purpose: optionalField(purposeSchema),
  from: optionalField(z.iso.date({ error: 'from must be a date (YYYY-MM-DD)' })),
  to: optionalField(z.iso.date({ error: 'to must be a date (YYYY-MM-DD)' })),
  notExact: optionalField(z.enum(['1'], { error: 'notExact is 1 or left out' })),
  page: optionalField(z.coerce.number({ error: 'page must be a whole number' }).int({ error: 'page must be a whole number' }).min(1).max(100_000)),
});
export type CountLogQuery = z.infer<typeof countLogQuerySchema>;

export interface CountLogRow {
  id: number;
  at: string;
  purpose: CountPurpose;
  partNumber: string;
  description: string;
  scaleName: string;
  operatorName: string;
  orderId: number | null;
  orderNumber: string | null;
  binCode: string | null;
  net: number;
  sampleQuantity: number;
  averagePieceWeight: number;
  count: number;
  expandedUncertainty: number;
  wholePieceRange: number;
  exact: boolean;
  targetQuantity: number | null;
  warnings: CountingWarning['code'][];
}

export interface CountEventDto {
  id: number;
  purpose: CountPurpose;
  partId: number;
  scaleId: number;
  /** The scale the load was weighed on, when not the sample's. */
  bulkScaleId: number | null;
  containerId: number | null;
  unit: 'g';
  gross: number;
  tare: number;
  net: number;
  sampleQuantity: number;
  sampleNetWeight: number;
  sampleOnPan: boolean;
  averagePieceWeight: number;
  pieceSpread: number;
  countRaw: number;
  count: number;
  standardUncertainty: number;
  expandedUncertainty: number;
  coverageFactor: number;
  exact: boolean;
  /** Chance that `count` is the true count; null for captures recorded before it was kept. */
  probabilityExact: number | null;
  /** ± whole pieces at 95 %: 0 exactly when exact. */
  wholePieceRange: number;
  targetQuantity: number | null;
  warnings: CountingWarning[];
  operatorId: number;
  orderLineId: number | null;
  binId: number | null;
  createdAt: string;
}
