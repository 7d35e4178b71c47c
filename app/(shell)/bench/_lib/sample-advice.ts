/** How many pieces to put on for the first sample, and how far the current sample reaches. */
import { DEFAULT_PIECE_SPREAD, findSampleForTarget, netWeightUncertainty, planGrowStep, type GrowPlan } from '@/lib/weighing';

/** A first sample of 10 is the usual starting point on counting scales (common practice). */
export const DEFAULT_SAMPLE_QUANTITY = 10;

export interface ScaleNoise {
  division: number;
  repeatability: number;
}

/**
 * With a known APW and a target, the smallest sample that makes the target exact (never below 10);
 * without one, or where no sample can, the usual 10 (the grow step then takes it further).
 */
export function suggestSampleQuantity(input: { noise: ScaleNoise; averagePieceWeight: number | null; pieceSpread: number | null; targetQuantity: number | null; sampleOnPan: boolean }): number {
  const { averagePieceWeight: apw, targetQuantity: target } = input;
  if (apw == null || apw <= 0 || target == null) return DEFAULT_SAMPLE_QUANTITY;
  const n = findSampleForTarget({
    targetQuantity: target,
    averagePieceWeight: apw,
    pieceSpread: input.pieceSpread ?? DEFAULT_PIECE_SPREAD,
    netWeightUncertainty: netWeightUncertainty(input.noise),
    sampleOnPan: input.sampleOnPan,
  });
  return n == null ? DEFAULT_SAMPLE_QUANTITY : Math.max(DEFAULT_SAMPLE_QUANTITY, Math.min(n, target));
}

export function planNextGrow(input: { noise: ScaleNoise; sample: { quantity: number; netWeight: number }; pieceSpread: number }): GrowPlan {
  return planGrowStep({
    sampleQuantity: input.sample.quantity,
    sampleNet: input.sample.netWeight,
    pieceSpread: input.pieceSpread,
    netWeightUncertainty: netWeightUncertainty(input.noise),
  });
}
