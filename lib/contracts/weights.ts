import { z } from 'zod';
import { WEIGHT_UNITS, type WeightUnit } from '@/lib/weighing/units';

export const unitSchema = z.enum(WEIGHT_UNITS as [WeightUnit, ...WeightUnit[]], { error: 'Unit must be g, kg, lb or oz' });

const numberError = (label: string) => ({
  error: (iss: { input: unknown }) => (iss.input === undefined ? `${label} is required` : `${label} must be a number`),
});

// At most 10^8 in the request's unit (100 t when in grams), far beyond any bench or floor scale, so the
// conversion to grams stays finite: 1.8e308 kg would become Infinity, which no column can take.
const MAX_WEIGHT = 100_000_000;
const implausible = (label: string) => ({ error: `${label} is implausibly large` });

export const positiveNumber = (label: string) =>
  z
    .number(numberError(label))
    .finite()
    .gt(0, { error: `${label} must be above 0` })
    .max(MAX_WEIGHT, implausible(label));
export const nonNegativeNumber = (label: string) =>
  z
    .number(numberError(label))
    .finite()
    .min(0, { error: `${label} cannot be negative` })
    .max(MAX_WEIGHT, implausible(label));
// A scale reading that may be a little negative (a drifted zero); bounded like every weight.
export const weightReading = (label: string) => z.number(numberError(label)).finite().min(-MAX_WEIGHT, implausible(label)).max(MAX_WEIGHT, implausible(label));
export const wholeCount = (label: string, min = 1) =>
  z
    .number(numberError(label))
    .int({ error: `${label} must be a whole number` })
    .min(min, { error: `${label} must be at least ${min}` })
    .max(10_000_000, { error: `${label} is implausibly large` });
