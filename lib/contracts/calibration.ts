import { z } from 'zod';
import { ACCURACY_CLASSES, type AccuracyClass } from '@/lib/metrology/accuracy-class';
import { requiredText } from './common';
import { nonNegativeNumber, positiveNumber, unitSchema, wholeCount } from './weights';

const stageSchema = z.enum(['initial', 'in_service'], { error: 'Stage must be initial or in_service' });
const indications = (label: string) => z.array(nonNegativeNumber(label), { error: `${label} must be a list of weights` });

const pointSchema = z.object({ load: positiveNumber('Load'), indication: nonNegativeNumber('Indication') });
const repeatabilitySchema = z.object({
  load: positiveNumber('Load'),
  indications: indications('Indications').min(2, { error: 'At least two weighings of the same load' }).max(50),
});
const eccentricitySchema = z.object({ load: positiveNumber('Load'), indications: indications('Indications').min(1).max(20) });

// POST /api/v1/calibration/evaluate — a test judged without recording it.
export const evaluateCalibrationSchema = z.object({
  accuracyClass: z.enum(ACCURACY_CLASSES as [AccuracyClass, ...AccuracyClass[]], { error: 'Accuracy class must be I, II, III or IIII' }),
  verificationInterval: positiveNumber('Verification interval e'),
  capacity: positiveNumber('Capacity'),
  unit: unitSchema,
  stage: stageSchema,
  points: z.array(pointSchema, { error: 'points must be a list' }).min(1, { error: 'At least one test point' }).max(50),
  repeatability: repeatabilitySchema.nullish(),
  eccentricity: eccentricitySchema.nullish(),
});
export type EvaluateCalibrationInput = z.infer<typeof evaluateCalibrationSchema>;

// POST /api/v1/scales/{id}/calibrations — the scale supplies class, e and Max.
export const recordCalibrationSchema = z.object({
  stage: stageSchema,
  performedAt: z.iso.date({ error: 'Date must be YYYY-MM-DD' }).optional(),
  unit: unitSchema.default('g'),
  points: z
    .array(pointSchema.extend({ testWeightIds: z.array(wholeCount('Test weight')).min(1, { error: 'Name the test weights that made up this load' }).max(30) }))
    .min(1, { error: 'At least one test point' })
    .max(50),
  repeatability: repeatabilitySchema.nullish(),
  eccentricity: eccentricitySchema.nullish(),
  zeroOk: z.boolean().default(true),
  tareOk: z.boolean().default(true),
  // Calibration interval: common practice is 6–12 months for bench scales; the shop's quality system decides.
  intervalDays: z.number().int().min(7).max(730).default(180),
  notes: z.string().trim().max(1000).nullish(),
});
export type RecordCalibrationInput = z.infer<typeof recordCalibrationSchema>;

export const lockScaleSchema = z.object({ reason: requiredText('Reason').trim().min(5, { error: 'Say why the scale is locked' }).max(300) });

export const createTestWeightSchema = z.object({
  identifier: requiredText('Identifier')
    .trim()
    .toUpperCase()
    .regex(/^[A-Z0-9][A-Z0-9._\-/]{0,39}$/, { error: 'Letters, digits and . _ - / only' }),
  nominal: positiveNumber('Nominal value'),
  unit: unitSchema.default('g'),
  weightClass: z.enum(['E2', 'F1', 'F2', 'M1', 'M2', 'M3'], { error: 'Class must be E2, F1, F2, M1, M2 or M3 (OIML R 111)' }),
  certificateNumber: z.string().trim().max(60).nullish(),
  dueAt: z.iso.date({ error: 'Date must be YYYY-MM-DD' }).nullish(),
});
export type CreateTestWeightInput = z.infer<typeof createTestWeightSchema>;

export interface TestWeightDto {
  id: number;
  identifier: string;
  nominal: number;
  unit: 'g';
  weightClass: string;
  mpeMg: number | null;
  certificateNumber: string | null;
  hasCertificate: boolean;
  dueAt: string | null;
  overdue: boolean;
  active: boolean;
  version: number;
}

export interface CalibrationRecordDto {
  id: number;
  scaleId: number;
  stage: 'initial' | 'in_service';
  performedAt: string;
  performedBy: number;
  verdict: unknown;
  weightsAdequate: boolean;
  weightProblems: string[];
  pass: boolean;
  nextDueAt: string | null;
  notes: string | null;
}
