/**
 * Growing the sample to refine the APW (docs/counting-model.md, "Growing the sample"):
 * add pieces up to what is within reach, accept the exact count as the new n.
 */
import { judgeCount } from './count-judgement';
import type { CountModel } from './count-variance';
import { exactReach, planningSpread } from './exact-reach';
import type { ReadingNoise } from './rounding-covariance';
import { spreadEstimate, spreadNodes, type SpreadBelief } from './spread-belief';

export interface GrowState {
  /** Current sample size n, all on the pan. */
  sampleQuantity: number;
  /** Net weight of the current sample, W_s (g). */
  sampleNet: number;
  spread: SpreadBelief;
  /** The scale's division and repeatability (g). */
  noise: ReadingNoise;
}

export interface GrowPlan {
  /** Pieces that may be added in one step and still count exactly. */
  maxAdd: number;
  /** Pan total after adding maxAdd. */
  maxTotal: number;
  tooLight: boolean;
}

export type GrowStepResult =
  | { accepted: true; sampleQuantity: number; sampleNet: number; averagePieceWeight: number; added: number }
  | { accepted: false; reason: 'unstable' | 'not_exact' | 'nothing_added'; count: number; wholePieceRange: number };

function modelOf(state: GrowState): CountModel {
  return { sampleQuantity: state.sampleQuantity, averagePieceWeight: state.sampleNet / state.sampleQuantity, sampleScale: state.noise, sampleOnPan: true };
}

/**
 * Pieces that may be added safely: up to the largest pan count within reach, so that a reading
 * which lands anywhere in its usual spread is still exact. `upTo` caps the pan total (a kit line's
 * window): growing past what the line needs only means taking pieces off again.
 */
export function planGrowStep(state: GrowState, upTo?: number): GrowPlan {
  const reach = exactReach(modelOf(state), planningSpread(spreadNodes(state.spread)));
  if (reach.tooLight) return { maxAdd: 0, maxTotal: state.sampleQuantity, tooLight: true };
  const cap = upTo == null ? reach.maxQuantity : Math.min(reach.maxQuantity, upTo);
  const maxAdd = Math.max(0, cap - state.sampleQuantity);
  return { maxAdd, maxTotal: state.sampleQuantity + maxAdd, tooLight: false };
}

/**
 * Accept a step only when the reading is stable and the new pan count is exact;
 * the accepted count becomes the new n and the pan weight the new W_s.
 */
export function acceptGrowStep(state: GrowState, panNet: number, stable: boolean): GrowStepResult {
  const model = modelOf(state);
  const nodes = spreadNodes(state.spread);
  const judged = judgeCount(model, panNet / model.averagePieceWeight, nodes, spreadEstimate(state.spread) ** 2, planningSpread(nodes));
  const rejected = { count: judged.count, wholePieceRange: judged.wholePieceRange };
  if (!stable) return { accepted: false, reason: 'unstable', ...rejected };
  if (!judged.exact) return { accepted: false, reason: 'not_exact', ...rejected };
  if (judged.count <= state.sampleQuantity) return { accepted: false, reason: 'nothing_added', ...rejected };
  return {
    accepted: true,
    sampleQuantity: judged.count,
    sampleNet: panNet,
    averagePieceWeight: panNet / judged.count,
    added: judged.count - state.sampleQuantity,
  };
}
