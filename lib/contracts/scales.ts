import { z } from 'zod';
import { ACCURACY_CLASSES, type AccuracyClass } from '@/lib/metrology/accuracy-class';
import { requiredText, versionSchema } from './common';
import { scaleConnectionSchema, type ScaleConnection } from './scale-connection';
import { nonNegativeNumber, positiveNumber, unitSchema } from './weights';

const classSchema = z.enum(ACCURACY_CLASSES as [AccuracyClass, ...AccuracyClass[]], { error: 'Accuracy class must be I, II, III or IIII' });

const scaleFields = {
  name: requiredText('Name').trim().min(1, { error: 'Name is required' }).max(80),
  location: z.string().trim().max(120).nullish(),
  unit: unitSchema.default('g'),
  capacity: positiveNumber('Capacity (Max)'),
  // Defaults to the class rule of OIML R 76-1 Table 3 when left out.
  minLoad: nonNegativeNumber('Min').optional(),
  division: positiveNumber('Division d'),
  // Defaults to d.
  verificationInterval: positiveNumber('Verification interval e').optional(),
  accuracyClass: classSchema,
  repeatability: nonNegativeNumber('Repeatability').nullish(),
  connection: scaleConnectionSchema,
};

export const createScaleSchema = z.object(scaleFields);
export type CreateScaleInput = z.infer<typeof createScaleSchema>;

export const updateScaleSchema = createScaleSchema.partial().extend({ unit: unitSchema.default('g'), version: versionSchema });
export type UpdateScaleInput = z.infer<typeof updateScaleSchema>;

export interface ScaleDto {
  id: number;
  name: string;
  location: string | null;
  unit: 'g';
  capacity: number;
  minLoad: number;
  division: number;
  verificationInterval: number;
  accuracyClass: AccuracyClass;
  intervals: number;
  repeatability: number | null;
  connection: ScaleConnection;
  status: 'in_service' | 'due' | 'locked';
  statusReason: string | null;
  calibrationDueAt: string | null;
  version: number;
}
