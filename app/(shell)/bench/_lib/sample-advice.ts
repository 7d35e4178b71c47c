/** How many pieces to put on for the first sample, and how far the current sample reaches. */
import { planGrowStep, planningSpread, sampleForTarget, spreadNodes, type GrowPlan, type SpreadBelief } from '@/lib/weighing';

/** A first sample of 10 is the usual starting point on counting scales (common practice). */
export const DEFAULT_SAMPLE_QUANTITY = 10;

export interface ScaleNoise {
  division: number;
  repeatability: number;
}

/**
 * With a known APW and a target, the smallest sample that puts the target within exact reach
 * (never below 10); without one, or where no sample can, the usual 10 (the grow step then takes it further).
 */
export function suggestSampleQuantity(input: { noise: ScaleNoise; averagePieceWeight: number | null; spread: SpreadBelief; targetQuantity: number | null; sampleOnPan: boolean }): number {
  const { averagePieceWeight: apw, targetQuantity: target } = input;
  if (apw == null || apw <= 0 || target == null) return DEFAULT_SAMPLE_QUANTITY;
  const n = sampleForTarget(
    { targetQuantity: target, averagePieceWeight: apw, sampleScale: input.noise, sampleOnPan: input.sampleOnPan },
    planningSpread(spreadNodes(input.spread)),
  );
  return n == null ? DEFAULT_SAMPLE_QUANTITY : Math.max(DEFAULT_SAMPLE_QUANTITY, Math.min(n, target));
}

/** How far the sample may grow in one step; never past `upTo` (what the line still needs), when given. */
export function planNextGrow(input: { noise: ScaleNoise; sample: { quantity: number; netWeight: number }; spread: SpreadBelief; upTo?: number }): GrowPlan {
  return planGrowStep({ sampleQuantity: input.sample.quantity, sampleNet: input.sample.netWeight, spread: input.spread, noise: input.noise }, input.upTo);
}
