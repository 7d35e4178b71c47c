/**
 * The estimate contract (POST /api/v1/counting/estimate) as one pure function.
 * Weights arrive and leave in the request's unit; the work is done in grams.
 * Output rounding: APW to 6 significant digits; countRaw to 2 decimals and count = round(countRaw);
 * uncertainties rounded UP to 2 decimals. `exact` is decided on the unrounded U < 0.5.
 * Show the result as `count ± toWholePieces(expandedUncertainty) pcs (95 %)`.
 */
import { measureApw } from './apw';
import { COVERAGE_FACTOR, countPieces } from './count';
import { assertEstimateInput, type EstimateCountInput, type EstimateCountOptions } from './estimate-input';
import { findMaxExactQuantity, findSampleForTarget } from './exact-range';
import { DEFAULT_PIECE_SPREAD } from './piece-spread';
import { roundDecimals, roundSignificant, roundUpDecimals } from './round';
import { netWeightUncertainty } from './uncertainty';
import { fromGrams, toGrams } from './units';
import { makeWarning, type CountingWarning, type WarningCode } from './warnings';

export type { EstimateCountInput, EstimateCountOptions } from './estimate-input';

export interface EstimateCountResult {
  averagePieceWeight: number;
  countRaw: number;
  count: number;
  standardUncertainty: number;
  expandedUncertainty: number;
  coverageFactor: number;
  exact: boolean;
  maxExactQuantity: number;
  recommendedSampleQuantity: number | null;
  warnings: CountingWarning[];
}

export function estimateCount(input: EstimateCountInput, options: EstimateCountOptions = {}): EstimateCountResult {
  assertEstimateInput(input);
  const g = (x: number): number => toGrams(x, input.unit);
  const onPan = input.sampleOnPan ?? true;
  const n = input.sample.quantity;
  const sampleNet = g(input.sample.netWeight);
  const bulkNet = g(input.netWeight);
  const division = g(input.scale.division);
  const assumed = input.pieceSpread == null;
  const c = input.pieceSpread ?? options.defaultPieceSpread ?? DEFAULT_PIECE_SPREAD;
  // Sample and load are weighed on the same scale, so one u(W) serves both.
  const uW = netWeightUncertainty({ division, repeatability: g(input.scale.repeatability ?? 0) });
  const apw = measureApw({ sampleNet, sampleQuantity: n, pieceSpread: c, sampleNetUncertainty: uW });
  const shared = { averagePieceWeight: apw.averagePieceWeight, pieceSpread: c, netWeightUncertainty: uW };
  const withSample = { ...shared, apwRelativeUncertainty: apw.relativeUncertainty, sampleQuantity: n, sampleOnPan: onPan };
  const counted = countPieces({ ...withSample, bulkNet });
  const range = findMaxExactQuantity(withSample);
  const target = input.targetQuantity;
  const recommended = target == null ? null : findSampleForTarget({ ...shared, targetQuantity: target, sampleOnPan: onPan });

  const codes: WarningCode[] = [];
  if (apw.averagePieceWeight < division) codes.push('apw_below_resolution');
  const { min, max } = input.scale;
  if (min != null && (input.netWeight < min || input.sample.netWeight < min)) codes.push('below_min_capacity');
  if (!counted.exact) codes.push('count_not_exact');
  if (target != null && (recommended == null || n < recommended)) codes.push('sample_too_small');
  if (max != null && (input.netWeight > max || input.sample.netWeight > max)) codes.push('over_capacity');
  if (assumed) codes.push('cv_assumed');

  const countRaw = roundDecimals(counted.countRaw, 2);
  return {
    averagePieceWeight: roundSignificant(fromGrams(apw.averagePieceWeight, input.unit), 6),
    countRaw,
    count: Math.round(countRaw),
    standardUncertainty: roundUpDecimals(counted.standardUncertainty, 2),
    expandedUncertainty: roundUpDecimals(counted.expandedUncertainty, 2),
    coverageFactor: COVERAGE_FACTOR,
    exact: counted.exact,
    maxExactQuantity: range.maxQuantity,
    recommendedSampleQuantity: recommended,
    warnings: codes.map(makeWarning),
  };
}
