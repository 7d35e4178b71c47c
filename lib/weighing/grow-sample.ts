/**
 * Growing the sample to refine the APW (COUNTING.md "Growing the sample"):
 * add pieces up to the largest exact quantity, accept the exact count as the new n.
 */
import { apwRelativeUncertainty } from './apw';
import { countPieces } from './count';
import { findExactLimit } from './exact-range';

export interface GrowState {
  /** Current sample size n, all on the pan. */
  sampleQuantity: number;
  /** Net weight of the current sample, W_s. */
  sampleNet: number;
  pieceSpread: number;
  /** u(W) of one net weight on this scale, same unit as sampleNet. */
  netWeightUncertainty: number;
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
  | { accepted: false; reason: 'unstable' | 'not_exact' | 'nothing_added'; count: number; expandedUncertainty: number };

function currentApw(state: GrowState): { apw: number; ur: number } {
  const apw = state.sampleNet / state.sampleQuantity;
  const ur = apwRelativeUncertainty({
    sampleNet: state.sampleNet,
    sampleQuantity: state.sampleQuantity,
    pieceSpread: state.pieceSpread,
    sampleNetUncertainty: state.netWeightUncertainty,
  });
  return { apw, ur };
}

/**
 * Pieces that may be added safely: the largest M with M + 1/2 ≤ M*, so that any
 * reading which rounds to the planned count is still exact (a plan right at the
 * limit would fail whenever the added pieces happen to weigh a little more).
 */
export function planGrowStep(state: GrowState): GrowPlan {
  const { apw, ur } = currentApw(state);
  const root = findExactLimit({
    averagePieceWeight: apw,
    apwRelativeUncertainty: ur,
    pieceSpread: state.pieceSpread,
    netWeightUncertainty: state.netWeightUncertainty,
    sampleQuantity: state.sampleQuantity,
    sampleOnPan: true,
  });
  if (root === null) return { maxAdd: 0, maxTotal: state.sampleQuantity, tooLight: true };
  const maxAdd = Number.isFinite(root) ? Math.max(0, Math.floor(root - 0.5)) : Number.MAX_SAFE_INTEGER;
  return { maxAdd, maxTotal: state.sampleQuantity + maxAdd, tooLight: false };
}

/**
 * Accept a step only when the reading is stable and the new pan count is exact;
 * the accepted count becomes the new n and the pan weight the new W_s.
 */
export function acceptGrowStep(state: GrowState, panNet: number, stable: boolean): GrowStepResult {
  const { apw, ur } = currentApw(state);
  const result = countPieces({
    bulkNet: panNet,
    averagePieceWeight: apw,
    apwRelativeUncertainty: ur,
    pieceSpread: state.pieceSpread,
    netWeightUncertainty: state.netWeightUncertainty,
    sampleQuantity: state.sampleQuantity,
    sampleOnPan: true,
  });
  const rejected = { count: result.count, expandedUncertainty: result.expandedUncertainty };
  if (!stable) return { accepted: false, reason: 'unstable', ...rejected };
  if (!result.exact) return { accepted: false, reason: 'not_exact', ...rejected };
  if (result.count <= state.sampleQuantity) return { accepted: false, reason: 'nothing_added', ...rejected };
  return {
    accepted: true,
    sampleQuantity: result.count,
    sampleNet: panNet,
    averagePieceWeight: panNet / result.count,
    added: result.count - state.sampleQuantity,
  };
}
