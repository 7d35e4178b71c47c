/** Learning the piece-weight spread c = σ/μ of a part (COUNTING.md "Learning the piece-weight spread"). */

/**
 * Used until a part's spread is learned; reported with `cv_assumed`.
 * 2 % suits typical stamped and moulded parts (common practice).
 */
export const DEFAULT_PIECE_SPREAD: number = 0.02;

/** Fewest observations before a learned spread replaces the default (our choice). */
export const MIN_INCREMENTS: number = 5;
export const MIN_SAMPLES: number = 3;

/**
 * A spread is only learned where the pieces' own scatter stands out from the weighing noise:
 * observed variance above four times the noise variance (our rule). On a scale too coarse for the
 * part the estimate would collapse to 0 and make counts look exact, so it is not trusted.
 */
export const RESOLUTION_FACTOR: number = 4;

export interface SpreadEstimate {
  pieceSpread: number;
  observations: number;
  enough: boolean;
}

export interface SampleRecord {
  quantity: number;
  averagePieceWeight: number;
}

/** Stable readings taken while adding one piece at a time → one increment per piece. */
export function incrementsFromReadings(readings: readonly number[]): number[] {
  const increments: number[] = [];
  for (let i = 1; i < readings.length; i += 1) increments.push(readings[i] - readings[i - 1]);
  return increments;
}

/**
 * c from single-piece increments: sample standard deviation relative to the mean,
 * minus the weighing noise u(W) of each increment in quadrature, floored at 0.
 */
export function spreadFromIncrements(
  increments: readonly number[],
  netWeightUncertainty: number = 0,
  minObservations: number = MIN_INCREMENTS,
): SpreadEstimate {
  const m = increments.length;
  if (m < 2) return { pieceSpread: 0, observations: m, enough: false };
  const mean = increments.reduce((sum, x) => sum + x, 0) / m;
  const ss = increments.reduce((sum, x) => sum + (x - mean) ** 2, 0);
  const observed = ss / (m - 1);
  const noise = netWeightUncertainty ** 2;
  const pieceSpread = mean > 0 ? Math.sqrt(Math.max(0, observed - noise)) / mean : 0;
  return { pieceSpread, observations: m, enough: m >= minObservations && mean > 0 && observed > RESOLUTION_FACTOR * noise };
}

/**
 * c from APWs of samples over time: Var(APW_i) ≈ μ²c²/n_i + u(W)²/n_i², so
 * Σ n_i(APW_i − μ̄)²/(K − 1), with μ̄ the n-weighted mean, estimates μ²c² plus
 * the mean of u(W)²/n_i, which is taken off. Lot-to-lot drift inflates it.
 */
export function spreadFromSamples(
  samples: readonly SampleRecord[],
  netWeightUncertainty: number = 0,
  minObservations: number = MIN_SAMPLES,
): SpreadEstimate {
  const k = samples.length;
  if (k < 2) return { pieceSpread: 0, observations: k, enough: false };
  const totalN = samples.reduce((sum, s) => sum + s.quantity, 0);
  const mean = samples.reduce((sum, s) => sum + s.quantity * s.averagePieceWeight, 0) / totalN;
  const weightedSs = samples.reduce((sum, s) => sum + s.quantity * (s.averagePieceWeight - mean) ** 2, 0);
  const noise = samples.reduce((sum, s) => sum + netWeightUncertainty ** 2 / s.quantity, 0) / k;
  const observed = weightedSs / (k - 1);
  const pieceSpread = mean > 0 ? Math.sqrt(Math.max(0, observed - noise)) / mean : 0;
  return { pieceSpread, observations: k, enough: k >= minObservations && mean > 0 && observed > RESOLUTION_FACTOR * noise };
}

/** The learned spread when there is enough of it, otherwise the default (flagged as assumed). */
export function choosePieceSpread(
  learned: SpreadEstimate | null | undefined,
  fallback: number = DEFAULT_PIECE_SPREAD,
): { pieceSpread: number; assumed: boolean } {
  if (learned && learned.enough) return { pieceSpread: learned.pieceSpread, assumed: false };
  return { pieceSpread: fallback, assumed: true };
}
