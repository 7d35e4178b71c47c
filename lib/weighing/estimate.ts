/**
 * The estimate contract (POST /api/v1/counting/estimate) as one pure function.
 * Weights arrive and leave in the request's unit; the work is done in grams.
 * Output rounding: APW to 6 significant digits; countRaw to 2 decimals; count = round of the
 * unrounded N̂ (rounded once); uncertainties rounded UP to 2 decimals; probabilityExact rounded
 * DOWN to 6 decimals, so no rounding can make a count look surer than it is. Show the result as
 * `count ± wholePieceRange pcs`: 0 exactly when `exact`.
 */
import { judgeCount, WHOLE_PIECE_P_VALUE } from './count-judgement';
import { apwRelativeVariance, type CountModel, type WeighingScale } from './count-variance';
import { assertEstimateInput, type EstimateCountInput, type EstimateCountOptions, type EstimateScale } from './estimate-input';
import { exactReach, planningSpread, sampleForTarget } from './exact-reach';
import { roundDecimals, roundDownDecimals, roundSignificant, roundUpDecimals } from './round';
import { ASSUMED_PIECE_SPREAD, givenSpread, spreadEstimate, spreadFromIncrements, spreadNodes, type SpreadBelief } from './spread-belief';
import { fromGrams, toGrams, type WeightUnit } from './units';
import { makeWarning, type CountingWarning, type WarningCode } from './warnings';

export type { EstimateCountInput, EstimateCountOptions } from './estimate-input';

export interface SpreadUsed {
  /** ĉ, the point estimate (or the given or assumed value). */
  value: number;
  source: 'given' | 'learned' | 'assumed';
  /** Degrees of freedom behind it; null when taken as well known or assumed. */
  degreesOfFreedom: number | null;
}

export interface EstimateCountResult {
  averagePieceWeight: number;
  countRaw: number;
  count: number;
  standardUncertainty: number;
  expandedUncertainty: number;
  coverageFactor: number;
  exact: boolean;
  probabilityExact: number;
  wholePieceRange: number;
  maxExactQuantity: number;
  recommendedSampleQuantity: number | null;
  pieceSpread: SpreadUsed;
  warnings: CountingWarning[];
}

function scaleInGrams(scale: EstimateScale, unit: WeightUnit): WeighingScale {
  const g = (x: number): number => toGrams(x, unit);
  return {
    division: g(scale.division),
    repeatability: g(scale.repeatability ?? 0),
    ...(scale.calibrationUncertainty != null ? { calibrationUncertainty: g(scale.calibrationUncertainty) } : {}),
  };
}

/** What the request says about the spread, most specific first, then the part's history. */
function spreadBeliefOf(
  input: EstimateCountInput,
  sampleScale: WeighingScale,
  options: EstimateCountOptions,
): { belief: SpreadBelief; source: SpreadUsed['source'] } {
  const increments = input.sample.increments;
  if (increments && input.pieceSpread == null) {
    const learned = spreadFromIncrements(
      increments.map((x) => toGrams(x, input.unit)),
      sampleScale,
    );
    if (learned) return { belief: learned, source: 'learned' };
  }
  if (input.pieceSpread != null) return { belief: givenSpread(input.pieceSpread, input.pieceSpreadDegreesOfFreedom), source: 'given' };
  if (options.spread) return { belief: options.spread, source: 'learned' };
  return { belief: { kind: 'assumed', pieceSpread: options.defaultPieceSpread ?? ASSUMED_PIECE_SPREAD }, source: 'assumed' };
}

function spreadUsed(belief: SpreadBelief, source: SpreadUsed['source']): SpreadUsed {
  return {
    value: roundSignificant(spreadEstimate(belief), 4),
    source,
    degreesOfFreedom: belief.kind === 'learned' ? belief.degreesOfFreedom : null,
  };
}

/** No shop counts a billion pieces on one pan; beyond it whole numbers lose their meaning in floating point. */
const MAX_PIECES = 1e9;

function finiteOrFail(values: Record<string, number>): void {
  for (const [field, value] of Object.entries(values)) {
    if (!Number.isFinite(value)) throw new RangeError(`estimateCount: ${field} cannot be computed from these weights`);
  }
}

/** What a kit line needs besides the contract's answer, to count a shared APW once. */
export interface CountShare {
  /** M at N̂. */
  uncertainPieces: number;
  /** u_r(APW)² at the spread's point estimate. */
  apwRelativeVariance: number;
}

export function estimateCount(input: EstimateCountInput, options: EstimateCountOptions = {}): EstimateCountResult {
  return assessCount(input, options).result;
}

/** The estimate and its share in a kit line's uncertainty. */
export function assessCount(input: EstimateCountInput, options: EstimateCountOptions = {}): { result: EstimateCountResult; share: CountShare } {
  assertEstimateInput(input);
  const g = (x: number): number => toGrams(x, input.unit);
  const n = input.sample.quantity;
  const sampleNet = g(input.sample.netWeight);
  const bulkNet = g(input.netWeight);
  const sampleScale = scaleInGrams(input.scale, input.unit);
  const bulkScale = input.bulkScale ? scaleInGrams(input.bulkScale, input.unit) : undefined;
  const onPan = bulkScale ? false : (input.sampleOnPan ?? true);
  const apw = sampleNet / n;
  const countRaw = bulkNet / apw;
  finiteOrFail({ 'sample.netWeight': apw, netWeight: countRaw });
  if (countRaw > MAX_PIECES) throw new RangeError(`estimateCount: netWeight would be more than ${MAX_PIECES} pieces of this part`);

  const model: CountModel = { sampleQuantity: n, averagePieceWeight: apw, sampleScale, bulkScale, sampleOnPan: onPan };
  const { belief, source } = spreadBeliefOf(input, sampleScale, options);
  const nodes = spreadNodes(belief);
  const planC2 = planningSpread(nodes);
  const judged = judgeCount(model, countRaw, nodes, spreadEstimate(belief) ** 2, planC2);
  const reach = exactReach(model, planC2);
  const target = input.targetQuantity;
  // On the pan a target at or below the sample is already on it: no sample to advise.
  const targetBeyondSample = target != null && (!onPan || target > n);
  const recommended =
    target == null || !targetBeyondSample
      ? null
      : sampleForTarget({ targetQuantity: target, averagePieceWeight: apw, sampleScale, bulkScale, sampleOnPan: onPan }, planC2);
  finiteOrFail({ expandedUncertainty: judged.expandedUncertainty, standardUncertainty: judged.standardUncertainty });

  const codes: WarningCode[] = [];
  const loadDivision = (bulkScale ?? sampleScale).division;
  if (apw < sampleScale.division) codes.push('apw_below_resolution');
  if (reach.tooLight) codes.push('single_piece_not_resolved');
  const { min, max } = input.scale;
  const loadScale = input.bulkScale ?? input.scale;
  if ((min != null && input.sample.netWeight < min) || (loadScale.min != null && input.netWeight < loadScale.min)) codes.push('below_min_capacity');
  if (!judged.exact) codes.push('count_not_exact');
  if (targetBeyondSample && (recommended == null || n < recommended)) codes.push('sample_too_small');
  const tare = input.tare ?? 0;
  if ((max != null && input.sample.netWeight + tare > max) || (loadScale.max != null && input.netWeight + tare > loadScale.max)) codes.push('over_capacity');
  if (belief.kind === 'assumed') codes.push('cv_assumed');
  // Only meaningful where a whole piece stands out from the weighing noise.
  if (apw >= loadDivision && judged.wholePiecePValue < WHOLE_PIECE_P_VALUE) codes.push('not_whole_pieces');

  const expanded = roundUpDecimals(judged.expandedUncertainty, 2);
  const standard = roundUpDecimals(judged.standardUncertainty, 2);
  const result: EstimateCountResult = {
    averagePieceWeight: roundSignificant(fromGrams(apw, input.unit), 6),
    countRaw: roundDecimals(countRaw, 2),
    count: judged.count,
    standardUncertainty: standard,
    expandedUncertainty: expanded,
    coverageFactor: roundDecimals(judged.expandedUncertainty / judged.standardUncertainty, 2),
    exact: judged.exact,
    probabilityExact: roundDownDecimals(judged.probabilityExact, 6),
    wholePieceRange: judged.wholePieceRange,
    maxExactQuantity: reach.maxQuantity,
    recommendedSampleQuantity: recommended,
    pieceSpread: spreadUsed(belief, source),
    warnings: codes.map(makeWarning),
  };
  const share = { uncertainPieces: judged.uncertainPieces, apwRelativeVariance: apwRelativeVariance(model, spreadEstimate(belief) ** 2) };
  return { result, share };
}
