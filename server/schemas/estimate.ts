import { z } from 'zod';
import { nonNegativeNumber, positiveNumber, unitSchema, wholeCount } from './weights';

// POST /api/v1/counting/estimate — every weight in `unit`, in and out.
export const estimateSchema = z.object({
  unit: unitSchema,
  scale: z.object(
    {
      division: positiveNumber('Division'),
      repeatability: nonNegativeNumber('Repeatability').optional(),
      max: positiveNumber('Max').optional(),
      min: nonNegativeNumber('Min').optional(),
    },
    { error: 'scale is required: { division, repeatability?, max?, min? }' },
  ),
  sample: z.object(
    { quantity: wholeCount('Sample quantity'), netWeight: positiveNumber('Sample net weight') },
    { error: 'sample is required: { quantity, netWeight }' },
  ),
  netWeight: positiveNumber('Net weight'),
  sampleOnPan: z.boolean({ error: 'sampleOnPan must be true or false' }).optional(),
  pieceSpread: z.number({ error: 'pieceSpread must be a number' }).min(0, { error: 'pieceSpread cannot be negative' }).lt(1, { error: 'pieceSpread must be below 1 (it is σ/μ)' }).optional(),
  targetQuantity: wholeCount('Target quantity').optional(),
});
export type EstimateInput = z.infer<typeof estimateSchema>;
