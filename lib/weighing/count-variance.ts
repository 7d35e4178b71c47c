/**
 * u(N̂)² of a count by weight, for one assumed piece spread c (docs/counting-model.md, "The count").
 * First-order propagation for N̂ = n·W_b/W_s with correlated inputs (JCGM 100:2008 5.1.2, 5.2.2),
 * every rounding covariance taken at its worst (rounding-covariance.ts).
 */
import { largestRoundingCovariance, mostNegativeRoundingCovariance, netVarianceBound, type ReadingNoise } from './rounding-covariance';
import { indicationVariance } from './uncertainty';

export interface WeighingScale extends ReadingNoise {
  /**
   * Standard uncertainty of the scale's calibration at the load it weighs here (same unit as d).
   * Counted only when sample and bulk are weighed on different scales: on one scale a slope error
   * cancels in the ratio W_b/W_s.
   */
  calibrationUncertainty?: number;
}

export interface CountModel {
  /** n, pieces in the sample. */
  sampleQuantity: number;
  /** APW = W_s/n as measured. */
  averagePieceWeight: number;
  /** The scale the sample was weighed on (and the bulk, unless bulkScale is given). */
  sampleScale: WeighingScale;
  /** A second scale for the bulk (a platform); the bulk is then weighed apart from the sample. */
  bulkScale?: WeighingScale;
  /** The sample stays on the pan and the load is counted with it (one zero for both). */
  sampleOnPan: boolean;
}

/** How the load relates to the sample: pieces added to it, taken off it, or weighed apart. */
export type PanGeometry = 'added' | 'taken_off' | 'apart';

export function geometryOf(model: CountModel, count: number): PanGeometry {
  if (!model.sampleOnPan || model.bulkScale) return 'apart';
  return count >= model.sampleQuantity ? 'added' : 'taken_off';
}

/** Pieces whose count is uncertain: |N − n| on the pan, N when weighed apart. */
export function uncertainPiecesOf(model: CountModel, count: number): number {
  return geometryOf(model, count) === 'apart' ? Math.max(0, count) : Math.abs(count - model.sampleQuantity);
}

function twoScales(model: CountModel): boolean {
  return model.bulkScale !== undefined;
}

/** Variance of the sample's net weight W_s (g²), worst rounding phase, given the spread c². */
export function sampleNetVariance(model: CountModel, c2: number): number {
  const a = model.averagePieceWeight;
  const spread = a * Math.sqrt(c2 * model.sampleQuantity);
  const calibration = twoScales(model) ? (model.sampleScale.calibrationUncertainty ?? 0) ** 2 : 0;
  return netVarianceBound(model.sampleScale, spread) + calibration;
}

/** u_r(APW)² = c²/n + u(W_s)²/W_s²: the part of a count's variance every count with this APW shares. */
export function apwRelativeVariance(model: CountModel, c2: number): number {
  const n = model.sampleQuantity;
  return c2 / n + sampleNetVariance(model, c2) / (n * model.averagePieceWeight) ** 2;
}

/**
 * Variance of the weighing error e_b − r·e_s (g²), r = N/n, for a true count N. On the pan the three
 * readings (zero I₀, sample I_s, load I_b) give, with R(Δ) the rounding covariance of readings Δ apart,
 *   V = R₀(2 + 2r² − 2r) + 2(r − 1)·R(B) + 2r(1 − r)·R(S) − 2r·R(B − S),
 * and each R is taken at its worst for the sign of its coefficient. Apart, the two nets have their
 * own zeros: V = u(W_b)² + r²·u(W_s)².
 */
function weighingVariance(model: CountModel, count: number, c2: number): number {
  const n = model.sampleQuantity;
  const a = model.averagePieceWeight;
  const r = count / n;
  const spreadOf = (pieces: number): number => a * Math.sqrt(c2 * Math.max(0, pieces));
  const geometry = geometryOf(model, count);
  if (geometry === 'apart') {
    const bulk = model.bulkScale ?? model.sampleScale;
    const bulkCalibration = twoScales(model) ? (bulk.calibrationUncertainty ?? 0) ** 2 : 0;
    return netVarianceBound(bulk, spreadOf(count)) + bulkCalibration + r * r * sampleNetVariance(model, c2);
  }
  const noise = model.sampleScale;
  const independent = indicationVariance(noise) * (2 + 2 * r * r - 2 * r);
  const moved = spreadOf(Math.abs(count - n));
  if (geometry === 'added') {
    return (
      independent +
      2 * (r - 1) * largestRoundingCovariance(noise, spreadOf(count)) +
      2 * r * (r - 1) * mostNegativeRoundingCovariance(noise, spreadOf(n)) +
      2 * r * mostNegativeRoundingCovariance(noise, moved)
    );
  }
  return (
    independent +
    2 * (1 - r) * mostNegativeRoundingCovariance(noise, spreadOf(count)) +
    2 * r * (1 - r) * largestRoundingCovariance(noise, spreadOf(n)) +
    2 * r * mostNegativeRoundingCovariance(noise, moved)
  );
}

/**
 * The pieces' own part of u(N̂)²: N̂ − n = n·A/S on the pan, a ratio of two independent means, so
 * M·c² + M²·c²/n pieces added (or N·c² + N²c²/n apart); with M taken off a sample of n the
 * remaining N = n − M share pieces with the sample: c²·M·(n − M)/n.
 */
function piecesVariance(model: CountModel, count: number, c2: number): number {
  const n = model.sampleQuantity;
  const m = uncertainPiecesOf(model, count);
  if (geometryOf(model, count) === 'taken_off') return (c2 * m * (n - m)) / n;
  return c2 * (m + (m * m) / n);
}

/** u(N̂)² in pieces² for a true count N (≥ 0) and a piece spread c² (relative variance). */
export function countVariance(model: CountModel, count: number, c2: number): number {
  return piecesVariance(model, count, c2) + weighingVariance(model, count, c2) / model.averagePieceWeight ** 2;
}

/**
 * How far N̂ jumps when one reading moves by one division: d/APW for the load, (N̂/n)·d/APW for the
 * sample (each on its own scale). A count that moves in steps this coarse is known only to the step.
 */
export function countStep(model: CountModel, countRaw: number): number {
  const a = model.averagePieceWeight;
  const load = (model.bulkScale ?? model.sampleScale).division / a;
  const sample = (Math.max(0, countRaw) / model.sampleQuantity) * (model.sampleScale.division / a);
  return Math.max(load, sample);
}
