import { z } from 'zod';
import { requiredText, versionSchema } from './common';
import { wholeCount } from './weights';

export const kitCodeSchema = requiredText('Kit code')
  .trim()
  .toUpperCase()
  .regex(/^[A-Z0-9][A-Z0-9._\-/]{0,39}$/, { error: 'Letters, digits and . _ - / only, at most 40 characters' });
export const revisionSchema = requiredText('Revision')
  .trim()
  .toUpperCase()
  .regex(/^[A-Z0-9]{1,8}$/, { error: 'Revision is 1–8 letters or digits, e.g. A or 03' });

const toleranceSchema = (label: string) =>
  z
    .number({ error: `${label} must be a whole number of pieces` })
    .int({ error: `${label} must be a whole number of pieces` })
    .min(0)
    .max(100_000)
    .default(0);

export const componentSchema = z.object({
  partId: wholeCount('Part'),
  quantity: wholeCount('Quantity per kit'),
  toleranceBelow: toleranceSchema('Tolerance below'),
  toleranceAbove: toleranceSchema('Tolerance above'),
});

const componentsSchema = z
  .array(componentSchema, { error: 'components must be a list' })
  .min(1, { error: 'A kit needs at least one part' })
  .max(500)
  .refine((list) => new Set(list.map((c) => c.partId)).size === list.length, { error: 'Each part may appear once per kit' });

export const createKitSchema = z.object({
  code: kitCodeSchema,
  revision: revisionSchema,
  description: requiredText('Description').trim().min(1, { error: 'Description is required' }).max(200),
  components: componentsSchema,
});
export type CreateKitInput = z.infer<typeof createKitSchema>;

export const updateKitSchema = z.object({
  description: createKitSchema.shape.description.optional(),
  active: z.boolean().optional(),
  components: componentsSchema.optional(),
  version: versionSchema,
});
export type UpdateKitInput = z.infer<typeof updateKitSchema>;

export const copyKitSchema = z.object({ revision: revisionSchema });

export interface KitComponentDto {
  partId: number;
  partNumber: string;
  description: string;
  quantity: number;
  toleranceBelow: number;
  toleranceAbove: number;
}

export interface KitDto {
  id: number;
  code: string;
  revision: string;
  description: string;
  active: boolean;
  components: KitComponentDto[];
  version: number;
  updatedAt: string;
}

// CSV cells are text: whole numbers of pieces written as digits.
const wholeText = (label: string, min: number) =>
  z
    .string()
    .trim()
    .regex(/^\d+$/, { error: `${label} must be a whole number` })
    .transform(Number)
    .pipe(
      z
        .number()
        .min(min, { error: `${label} must be at least ${min}` })
        .max(100_000, { error: `${label} is implausibly large` }),
    );

export const BOM_CSV_COLUMNS = ['kit_code', 'revision', 'description', 'part_number', 'quantity', 'tolerance_below', 'tolerance_above'] as const;

export const bomCsvRowSchema = z.object({
  kit_code: kitCodeSchema,
  revision: revisionSchema,
  description: z.string().trim().max(200, { error: 'At most 200 characters' }),
  part_number: requiredText('Part number').trim().toUpperCase().min(1, { error: 'Part number is required' }),
  quantity: wholeText('Quantity', 1),
  tolerance_below: z
    .string()
    .trim()
    .transform((t) => t || '0')
    .pipe(wholeText('Tolerance below', 0)),
  tolerance_above: z
    .string()
    .trim()
    .transform((t) => t || '0')
    .pipe(wholeText('Tolerance above', 0)),
});

export interface BomImportRow {
  line: number;
  kitCode: string;
  revision: string;
  description: string;
  partNumber: string;
  quantity: string;
  toleranceBelow: string;
  toleranceAbove: string;
  // An existing revision has its bill of material replaced by the file's lines.
  action: 'create' | 'replace';
  errors: Record<string, string>;
}
