/** The usual first sample, and how far the current sample may grow (the first sample itself: scale-advice.ts). */
import { planGrowStep, type GrowPlan, type SpreadBelief } from '@/lib/weighing';

/** A first sample of 10 is the usual starting point on counting scales (common practice). */
export const DEFAULT_SAMPLE_QUANTITY = 10;

export interface ScaleNoise {
  division: number;
  repeatability: number;
}

/** How far the sample may grow in one step; never past `upTo` (what the line still needs), when given. */
export function planNextGrow(input: { noise: ScaleNoise; sample: { quantity: number; netWeight: number }; spread: SpreadBelief; upTo?: number }): GrowPlan {
  return planGrowStep({ sampleQuantity: input.sample.quantity, sampleNet: input.sample.netWeight, spread: input.spread, noise: input.noise }, input.upTo);
}
