import { z } from 'zod';
import { MAX_INCREMENTS } from '@/lib/weighing/estimate-input';
import { nonNegativeNumber, positiveNumber, unitSchema, weightReading, wholeCount } from './weights';

const scaleSchema = (name: string) =>
  z.object(
    {
      division: positiveNumber('Division'),
      repeatability: nonNegativeNumber('Repeatability').optional(),
      max: positiveNumber('Max').optional(),
      min: nonNegativeNumber('Min').optional(),
      calibrationUncertainty: nonNegativeNumber('Calibration uncertainty').optional(),
    },
    { error: `${name} is required: { division, repeatability?, max?, min?, calibrationUncertainty? }` },
  );

// POST /api/v1/counting/estimate — every weight in `unit`, in and out.
export const estimateSchema = z
  .object({
    unit: unitSchema,
    scale: scaleSchema('scale'),
    sample: z.object(
      {
        quantity: wholeCount('Sample quantity'),
        netWeight: positiveNumber('Sample net weight'),
        // One net weight increase per single piece put on while sampling: the spread is learned from them.
        increments: z
          .array(weightReading('Each increment'), { error: 'increments must be a list of weights' })
          .min(2, { error: 'Give at least 2 single-piece increments' })
          .max(MAX_INCREMENTS, { error: `At most ${MAX_INCREMENTS} increments` })
          .optional(),
      },
      { error: 'sample is required: { quantity, netWeight, increments? }' },
    ),
    netWeight: positiveNumber('Net weight'),
    sampleOnPan: z.boolean({ error: 'sampleOnPan must be true or false' }).optional(),
    pieceSpread: z
      .number({ error: 'pieceSpread must be a number' })
      .min(0, { error: 'pieceSpread cannot be negative' })
      .lt(1, { error: 'pieceSpread must be below 1 (it is σ/μ)' })
      .optional(),
    pieceSpreadDegreesOfFreedom: wholeCount('pieceSpreadDegreesOfFreedom').optional(),
    tare: nonNegativeNumber('Tare').optional(),
    bulkScale: scaleSchema('bulkScale').optional(),
    targetQuantity: wholeCount('Target quantity').optional(),
  })
  .superRefine((body, ctx) => {
    if (body.pieceSpreadDegreesOfFreedom != null && body.pieceSpread == null) {
      ctx.addIssue({ code: 'custom', path: ['pieceSpreadDegreesOfFreedom'], message: 'Give pieceSpread with its degrees of freedom' });
    }
    if (body.bulkScale && body.sampleOnPan === true) {
      ctx.addIssue({ code: 'custom', path: ['sampleOnPan'], message: 'With a bulkScale the sample is weighed apart: sampleOnPan must be false' });
    }
    if (body.sample.netWeight < body.scale.division) {
      ctx.addIssue({ code: 'custom', path: ['sample', 'netWeight'], message: 'A sample lighter than one division cannot have been weighed on this scale' });
    }
  });
export type EstimateInput = z.infer<typeof estimateSchema>;
