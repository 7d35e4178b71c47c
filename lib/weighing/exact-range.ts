/** How far a sample reaches: the largest exact quantity, and the sample a target needs (COUNTING.md). */
import { apwRelativeUncertainty } from './apw';
import { COVERAGE_FACTOR, EXACT_LIMIT, countVariance, countVariancePolynomial, type SharedZero } from './count';

export interface ExactRangeInput {
  averagePieceWeight: number;
  apwRelativeUncertainty: number;
  pieceSpread: number;
  /** u(W) of a net weight, same unit as averagePieceWeight. */
  netWeightUncertainty: number;
  sampleQuantity: number;
  sampleOnPan: boolean;
  coverageFactor?: number;
}

export interface ExactRange {
  /** Largest M that is still exact; 0 when the piece is too light for the scale. */
  maxUncertainPieces: number;
  /** Largest whole-pan (on pan) or bulk (apart) quantity that is still exact; 0 when too light. */
  maxQuantity: number;
  /** Not even one piece is resolved: k²·u(W)²/APW² ≥ 1/4. */
  tooLight: boolean;
}

/** Pieces are added to a sample on the pan (it shares their zero); null when the bulk is weighed apart. */
function sharedZeroWhenAdding(sampleOnPan: boolean, sampleQuantity: number): SharedZero | null {
  return sampleOnPan ? { sampleQuantity, piecesTakenOff: false } : null;
}

/**
 * The M* where k·u(N̂) reaches 1/2. countVariancePolynomial gives u(N̂)² = q·M² + l·M + w, with
 * l = c² + u(W)²/(n·APW²) on the pan (shared zero) and l = c² apart; solve a·M² + b·M + c0 = 0
 * with a = k²q, b = k²l, c0 = k²w − 1/4; null when c0 ≥ 0 (too light). The positive root is
 * written as 2(−c0)/(b + √(b² − 4a·c0)) to avoid cancellation when a is tiny.
 */
export function findExactLimit(input: ExactRangeInput): number | null {
  const k = input.coverageFactor ?? COVERAGE_FACTOR;
  const p = countVariancePolynomial({ ...input, sharedZero: sharedZeroWhenAdding(input.sampleOnPan, input.sampleQuantity) });
  const a = k * k * p.quadratic;
  const b = k * k * p.linear;
  const c0 = k * k * p.constant - EXACT_LIMIT ** 2;
  if (c0 >= 0) return null;
  return a === 0 && b === 0 ? Infinity : (2 * -c0) / (b + Math.sqrt(b * b - 4 * a * c0));
}

/** Largest M with k·u(N̂) < 1/2 (floor of M*, strict), plus n back on the pan. */
export function findMaxExactQuantity(input: ExactRangeInput): ExactRange {
  const root = findExactLimit(input);
  if (root === null) return { maxUncertainPieces: 0, maxQuantity: 0, tooLight: true };
  // Strict inequality: a root that is a whole number is itself not exact.
  const maxUncertainPieces = Math.max(0, Math.ceil(root) - 1);
  const maxQuantity = input.sampleOnPan ? maxUncertainPieces + input.sampleQuantity : maxUncertainPieces;
  return { maxUncertainPieces, maxQuantity, tooLight: false };
}

export interface SampleForTargetInput {
  targetQuantity: number;
  averagePieceWeight: number;
  pieceSpread: number;
  netWeightUncertainty: number;
  sampleOnPan: boolean;
  coverageFactor?: number;
  /** Largest sample worth proposing; default T − 1 on the pan, T apart (beyond that, count by hand). */
  maxSample?: number;
}

/** True when a sample of n makes the target T exact, with W_s = n·APW weighed on the same scale. */
export function isTargetExact(input: SampleForTargetInput, n: number): boolean {
  const k = input.coverageFactor ?? COVERAGE_FACTOR;
  const apw = input.averagePieceWeight;
  const ur = apwRelativeUncertainty({
    sampleNet: n * apw, sampleQuantity: n, pieceSpread: input.pieceSpread, sampleNetUncertainty: input.netWeightUncertainty,
  });
  const variance = countVariance({
    averagePieceWeight: apw,
    apwRelativeUncertainty: ur,
    pieceSpread: input.pieceSpread,
    netWeightUncertainty: input.netWeightUncertainty,
    uncertainPieces: input.sampleOnPan ? input.targetQuantity - n : input.targetQuantity,
    sharedZero: sharedZeroWhenAdding(input.sampleOnPan, n),
  });
  return k * k * variance < EXACT_LIMIT ** 2;
}

/**
 * Smallest sample n that makes T exact, or null when none up to maxSample does
 * (the c²·M term alone may exceed the limit). u(N̂) falls as n grows in both cases (on the
 * pan the weighing part (u(W)/APW)²·(1 + r + r²), r = (T − n)/n, falls as r does), so a
 * binary search over n finds the boundary.
 */
export function findSampleForTarget(input: SampleForTargetInput): number | null {
  const t = Math.floor(input.targetQuantity);
  const cap = input.sampleOnPan ? t - 1 : t;
  // On the pan a sample of T or more leaves nothing to count by weight.
  const hi0 = Math.floor(input.sampleOnPan ? Math.min(input.maxSample ?? cap, cap) : (input.maxSample ?? cap));
  if (t < 1 || hi0 < 1 || !isTargetExact(input, hi0)) return null;
  let lo = 1;
  let hi = hi0;
  while (lo < hi) {
    const mid = Math.floor((lo + hi) / 2);
    if (isTargetExact(input, mid)) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}
