/** Input of estimateCount and the range checks it enforces (bad input is refused where defined). */
import type { SpreadBelief } from './spread-belief';
import { isWeightUnit, type WeightUnit } from './units';

export interface EstimateScale {
  /** Division d used for counting, in `unit`. */
  division: number;
  /** Repeatability s_r, in `unit`; 0 when absent. */
  repeatability?: number;
  max?: number;
  min?: number;
  /**
   * Standard uncertainty of this scale's calibration at the load it weighs, in `unit` (from its
   * calibration record, or MPE/√3). Used only when sample and bulk are on different scales.
   */
  calibrationUncertainty?: number;
}

export interface EstimateCountInput {
  /** Unit of every weight in the request and the response. */
  unit: WeightUnit;
  /** The scale the sample is weighed on (and the load, unless bulkScale is given). */
  scale: EstimateScale;
  sample: {
    quantity: number;
    netWeight: number;
    /** Net weight changes, one per single piece put on while sampling (0 or below when the reading did not rise): the spread is learned from them. */
    increments?: number[];
  };
  /** Net load being counted: the whole pan when the sample stays on it. */
  netWeight: number;
  /** Default true: the sample stays on the pan and pieces are added. Must be false with bulkScale. */
  sampleOnPan?: boolean;
  /** c = σ/μ of single-piece weight; when absent (and no increments) a cautious value is assumed (`cv_assumed`). */
  pieceSpread?: number;
  /** Degrees of freedom of a given pieceSpread; absent: well known. */
  pieceSpreadDegreesOfFreedom?: number;
  /** The container's weight on the pan, so capacity is checked on the gross. */
  tare?: number;
  /** The scale the bulk is weighed on, when not the sample's (a platform for the bulk). */
  bulkScale?: EstimateScale;
  targetQuantity?: number;
}

export interface EstimateCountOptions {
  /** Site value for an unknown spread (a cautious upper value), used when the request has none. */
  defaultPieceSpread?: number;
  /** What the part's history says about its spread, used when the request says nothing. */
  spread?: SpreadBelief | null;
}

const finite = (x: unknown): x is number => typeof x === 'number' && Number.isFinite(x);
const wholeAtLeastOne = (x: unknown): x is number => finite(x) && Number.isInteger(x) && x >= 1;

/** Most single-piece increments one request may carry. */
export const MAX_INCREMENTS = 10_000;

type Fail = (field: string, rule: string) => never;

function checkScale(scale: EstimateScale | undefined, prefix: string, fail: Fail): void {
  const { division, repeatability, max, min, calibrationUncertainty } = scale ?? ({} as EstimateScale);
  if (!finite(division) || division <= 0) fail(`${prefix}.division`, 'must be a number above 0');
  if (repeatability != null && (!finite(repeatability) || repeatability < 0)) fail(`${prefix}.repeatability`, 'must be 0 or more');
  if (max != null && (!finite(max) || max <= 0)) fail(`${prefix}.max`, 'must be a number above 0');
  if (min != null && (!finite(min) || min < 0)) fail(`${prefix}.min`, 'must be 0 or more');
  if (calibrationUncertainty != null && (!finite(calibrationUncertainty) || calibrationUncertainty < 0)) {
    fail(`${prefix}.calibrationUncertainty`, 'must be 0 or more');
  }
}

/** Throws RangeError naming the first field out of range. */
export function assertEstimateInput(input: EstimateCountInput): void {
  const fail: Fail = (field, rule) => {
    throw new RangeError(`estimateCount: ${field} ${rule}`);
  };
  if (!isWeightUnit(input.unit)) fail('unit', 'must be one of g, kg, lb, oz');
  checkScale(input.scale, 'scale', fail);
  if (input.bulkScale != null) {
    checkScale(input.bulkScale, 'bulkScale', fail);
    if (input.sampleOnPan === true) fail('sampleOnPan', 'must be false when the bulk is weighed on another scale');
  }
  if (!wholeAtLeastOne(input.sample?.quantity)) fail('sample.quantity', 'must be a whole number of at least 1');
  if (!finite(input.sample.netWeight) || input.sample.netWeight <= 0) fail('sample.netWeight', 'must be above 0');
  // A reading moves in whole divisions: a sample lighter than one cannot have been seen at all.
  if (input.sample.netWeight < input.scale.division) fail('sample.netWeight', 'must be at least one scale division');
  if (!finite(input.netWeight) || input.netWeight < 0) fail('netWeight', 'must be 0 or more');
  const increments = input.sample.increments;
  if (increments != null) {
    if (!Array.isArray(increments) || increments.length < 2 || increments.length > MAX_INCREMENTS) {
      fail('sample.increments', `must list 2 to ${MAX_INCREMENTS} single-piece weights`);
    }
    // A piece near the division can leave the reading unchanged or, with noise, lower it: 0 and below are real readings.
    if (!increments.every((x) => finite(x))) fail('sample.increments', 'must each be a number');
  }
  const c = input.pieceSpread;
  if (c != null && (!finite(c) || c < 0 || c >= 1)) fail('pieceSpread', 'must be at least 0 and below 1');
  const dof = input.pieceSpreadDegreesOfFreedom;
  if (dof != null && (!wholeAtLeastOne(dof) || c == null)) fail('pieceSpreadDegreesOfFreedom', 'must be a whole number of at least 1, given with pieceSpread');
  if (input.tare != null && (!finite(input.tare) || input.tare < 0)) fail('tare', 'must be 0 or more');
  if (input.targetQuantity != null && !wholeAtLeastOne(input.targetQuantity)) {
    fail('targetQuantity', 'must be a whole number of at least 1');
  }
}
