/**
 * Count by weight and its uncertainty (COUNTING.md "Count"; first-order
 * propagation for a quotient, JCGM 100:2008 5.1.2 and 5.1.6, with correlated inputs 5.2.2).
 */

/** k = 2 gives about 95 % for a near-normal result (NIST TN 1297 §6.2). */
export const COVERAGE_FACTOR: number = 2;

/** A count is exact when U is below half a piece: round(N̂) is then right at about 95 %. */
export const EXACT_LIMIT: number = 0.5;

export interface CountInput {
  /** Net load on the pan W (whole pan when the sample stays on it). */
  bulkNet: number;
  averagePieceWeight: number;
  apwRelativeUncertainty: number;
  pieceSpread: number;
  /** u(W) of the load's net weight, same unit as bulkNet. */
  netWeightUncertainty: number;
  sampleQuantity: number;
  /** true: sample left on the pan and pieces added; false: bulk weighed apart. */
  sampleOnPan: boolean;
  coverageFactor?: number;
}

export interface CountResult {
  countRaw: number;
  count: number;
  /** M: pieces whose count is uncertain (N̂ − n on the pan, N̂ apart). */
  uncertainPieces: number;
  standardUncertainty: number;
  expandedUncertainty: number;
  coverageFactor: number;
  exact: boolean;
}

/**
 * The sample left on the pan: the load's net weight W_b = I_b − I_0 and the sample's W_s = I_s − I_0
 * are read against the same zero indication I_0, so their errors are correlated.
 */
export interface SharedZero {
  /** n, the pieces of the sample on the pan. */
  sampleQuantity: number;
  /** Pieces were taken off the sample rather than added: the shared-zero term then changes sign. */
  piecesTakenOff: boolean;
}

export interface CountVarianceModel {
  pieceSpread: number;
  apwRelativeUncertainty: number;
  netWeightUncertainty: number;
  averagePieceWeight: number;
  /** Set when the sample stays on the pan; null when the bulk is weighed apart on its own tare. */
  sharedZero: SharedZero | null;
}

export interface CountVarianceTerms extends CountVarianceModel {
  /** M ≥ 0: pieces whose count is uncertain (|N̂ − n| on the pan, N̂ apart). */
  uncertainPieces: number;
}

/** u(N̂)² = quadratic·M² + linear·M + constant, in pieces², for M ≥ 0 uncertain pieces. */
export interface CountVariancePolynomial {
  quadratic: number;
  linear: number;
  constant: number;
}

/**
 * The one statement of u(N̂)² (countPieces and the exact-range search both evaluate it), pieces²:
 *
 *   u(N̂)² = M·c² + M²·u_r(APW)² + (u(W)²/APW²)·(1 + s·M/n)
 *
 * with s = +1 (pieces added) or −1 (taken off) on the pan, s = 0 for a bulk weighed apart.
 *
 * M·c²: the uncertain pieces' own spread; M²·u_r(APW)²: the sample's error scaled up; u(W)²/APW²:
 * the weighing of the load. The s·M/n term refines COUNTING.md's formula for the sample-on-pan
 * case, which treats W_s and W_b as independent although both are read against the same zero
 * I_0 (W_s = I_s − I_0, W_b = I_b − I_0, so u(W_s, W_b) = u(W)²/2). GUM (JCGM 100:2008) 5.2.2,
 * correlated inputs, for N̂ = n·W_b/W_s with N̂ = n + M: sensitivities 1/APW and −(N̂/n)/APW give
 * a weighing part (u(W)²/APW²)·(1 + (N̂/n)² − N̂/n) = (u(W)²/APW²)·(1 + M/n + M²/n²); the M²/n²
 * part is already in M²·u_r(APW)², so M/n is what was missing (pieces taken off, N̂ = n − M: −M/n).
 * A bulk weighed apart has its own tare indication: no shared term.
 */
export function countVariancePolynomial(model: CountVarianceModel): CountVariancePolynomial {
  const c2 = model.pieceSpread ** 2;
  const weighing = (model.netWeightUncertainty / model.averagePieceWeight) ** 2;
  const zero = model.sharedZero;
  const sharedZero = zero === null ? 0 : (zero.piecesTakenOff ? -1 : 1) * (weighing / zero.sampleQuantity);
  return { quadratic: model.apwRelativeUncertainty ** 2, linear: c2 + sharedZero, constant: weighing };
}

export function countVariance(terms: CountVarianceTerms): number {
  const p = countVariancePolynomial(terms);
  const m = terms.uncertainPieces;
  return p.quadratic * m * m + p.linear * m + p.constant;
}

export function countPieces(input: CountInput): CountResult {
  const k = input.coverageFactor ?? COVERAGE_FACTOR;
  const countRaw = input.bulkNet / input.averagePieceWeight;
  // Fewer pieces than the sample means pieces were taken off: those are the uncertain ones.
  const uncertainPieces = input.sampleOnPan ? Math.abs(countRaw - input.sampleQuantity) : countRaw;
  const sharedZero: SharedZero | null = input.sampleOnPan
    ? { sampleQuantity: input.sampleQuantity, piecesTakenOff: countRaw < input.sampleQuantity }
    : null;
  const variance = countVariance({ ...input, uncertainPieces, sharedZero });
  const standardUncertainty = Math.sqrt(variance);
  const expandedUncertainty = k * standardUncertainty;
  return {
    countRaw,
    count: Math.round(countRaw),
    uncertainPieces,
    standardUncertainty,
    expandedUncertainty,
    coverageFactor: k,
    exact: expandedUncertainty < EXACT_LIMIT,
  };
}

/**
 * U as whole pieces, half up: the half-width to show as "N ± U pcs". If |N̂ − N| < U then
 * |round(N̂) − N| ≤ round(U), so this keeps the 95 % coverage that a bare U < 1 would lose
 * (round(N̂) ± 0.9 contains no neighbour at all). 0 exactly when the count is exact.
 */
export function toWholePieces(expandedUncertainty: number): number {
  return Math.floor(Math.max(0, expandedUncertainty) + 0.5);
}
