import { z } from 'zod';
import { isTimeZone } from '@/lib/time/site-clock';
import { WEIGHT_UNITS, type WeightUnit } from '@/lib/weighing/units';
import { versionSchema } from './common';

export const updateSettingsSchema = z.object({
  siteName: z.string().trim().min(1, { error: 'Site name is required' }).max(120).optional(),
  displayUnit: z.enum(WEIGHT_UNITS as [WeightUnit, ...WeightUnit[]], { error: 'Unit must be g, kg, lb or oz' }).optional(),
  defaultPieceSpread: z
    .number({ error: 'A number, e.g. 0.05 for 5 %' })
    .gt(0, { error: 'Must be above 0' })
    .max(0.5, { error: 'At most 0.5 (50 %)' })
    .optional(),
  stabilityWindowMs: z.number().int().min(200, { error: 'At least 200 ms' }).max(10_000, { error: 'At most 10 s' }).optional(),
  varianceThresholdPct: z.number().min(0).max(100).optional(),
  varianceThresholdPcs: z.number().int().min(0).max(1_000_000).optional(),
  blindCycleCounts: z.boolean({ error: 'blindCycleCounts must be true or false' }).optional(),
  sessionHours: z
    .number({ error: 'A whole number of hours' })
    .int({ error: 'A whole number of hours' })
    .min(1, { error: 'At least 1 hour' })
    .max(72, { error: 'At most 72 hours' })
    .optional(),
  fourEyesVariances: z.boolean({ error: 'fourEyesVariances must be true or false' }).optional(),
  // null: follow the server's own zone.
  timeZone: z
    .string({ error: 'A time zone name such as Europe/Berlin' })
    .trim()
    .refine(isTimeZone, { error: 'Not a time zone this server knows; use a name such as Europe/Berlin or America/Chicago' })
    .nullable()
    .optional(),
  version: versionSchema,
});
export type UpdateSettingsInput = z.infer<typeof updateSettingsSchema>;

export interface SettingsDto {
  siteName: string;
  displayUnit: WeightUnit;
  defaultPieceSpread: number;
  stabilityWindowMs: number;
  varianceThresholdPct: number;
  varianceThresholdPcs: number;
  blindCycleCounts: boolean;
  /** The zone days and times follow: the site's own, or the server's when none is set. */
  timeZone: string;
  timeZoneFromServer: boolean;
  /** Hours a session lasts from sign-in, however busy (new sessions take a change). */
  sessionHours: number;
  fourEyesVariances: boolean;
  version: number;
}
