/**
 * Count by weight and its uncertainty (COUNTING.md "Count"; first-order
 * propagation for a quotient, JCGM 100:2008 5.1.2 and 5.1.6).
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

export interface CountVarianceTerms {
  uncertainPieces: number;
  pieceSpread: number;
  apwRelativeUncertainty: number;
  netWeightUncertainty: number;
  averagePieceWeight: number;
}

/**
 * u(N̂)² = M·c² + M²·u_r(APW)² + u(W)²/APW², in pieces²: the added pieces'
 * own spread, the sample's error scaled up, and the weighing of the load.
 */
export function countVariance(terms: CountVarianceTerms): number {
  const m = terms.uncertainPieces;
  const c = terms.pieceSpread;
  const ur = terms.apwRelativeUncertainty;
  const weighing = terms.netWeightUncertainty / terms.averagePieceWeight;
  return m * c * c + m * m * ur * ur + weighing * weighing;
}

export function countPieces(input: CountInput): CountResult {
  const k = input.coverageFactor ?? COVERAGE_FACTOR;
  const countRaw = input.bulkNet / input.averagePieceWeight;
  // Fewer pieces than the sample means pieces were taken off: those are the uncertain ones.
  const uncertainPieces = input.sampleOnPan ? Math.abs(countRaw - input.sampleQuantity) : countRaw;
  const variance = countVariance({ ...input, uncertainPieces });
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
