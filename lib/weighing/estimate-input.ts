/** Input of estimateCount and the range checks it enforces (bad input is refused where defined). */
import { isWeightUnit, type WeightUnit } from './units';

export interface EstimateScale {
  /** Division d used for counting, in `unit`. */
  division: number;
  /** Repeatability s_r, in `unit`; 0 when absent. */
  repeatability?: number;
  max?: number;
  min?: number;
}

export interface EstimateCountInput {
  /** Unit of every weight in the request and the response. */
  unit: WeightUnit;
  scale: EstimateScale;
  sample: { quantity: number; netWeight: number };
  /** Net load being counted: the whole pan when the sample stays on it. */
  netWeight: number;
  /** Default true: the sample stays on the pan and pieces are added. */
  sampleOnPan?: boolean;
  /** c = σ/μ of single-piece weight; when absent the site default is used (`cv_assumed`). */
  pieceSpread?: number;
  targetQuantity?: number;
}

export interface EstimateCountOptions {
  /** Site default piece spread, used when the request has none. */
  defaultPieceSpread?: number;
}

const finite = (x: unknown): x is number => typeof x === 'number' && Number.isFinite(x);
const wholeAtLeastOne = (x: unknown): x is number => finite(x) && Number.isInteger(x) && x >= 1;

/** Throws RangeError naming the first field out of range. */
export function assertEstimateInput(input: EstimateCountInput): void {
  const fail = (field: string, rule: string): never => {
    throw new RangeError(`estimateCount: ${field} ${rule}`);
  };
  if (!isWeightUnit(input.unit)) fail('unit', 'must be one of g, kg, lb, oz');
  const { division, repeatability, max, min } = input.scale ?? ({} as EstimateScale);
  if (!finite(division) || division <= 0) fail('scale.division', 'must be a number above 0');
  if (repeatability != null && (!finite(repeatability) || repeatability < 0)) fail('scale.repeatability', 'must be 0 or more');
  if (max != null && (!finite(max) || max <= 0)) fail('scale.max', 'must be a number above 0');
  if (min != null && (!finite(min) || min < 0)) fail('scale.min', 'must be 0 or more');
  if (!wholeAtLeastOne(input.sample?.quantity)) fail('sample.quantity', 'must be a whole number of at least 1');
  if (!finite(input.sample.netWeight) || input.sample.netWeight <= 0) fail('sample.netWeight', 'must be above 0');
  if (!finite(input.netWeight) || input.netWeight < 0) fail('netWeight', 'must be 0 or more');
  const c = input.pieceSpread;
  if (c != null && (!finite(c) || c < 0 || c >= 1)) fail('pieceSpread', 'must be at least 0 and below 1');
  if (input.targetQuantity != null && !wholeAtLeastOne(input.targetQuantity)) {
    fail('targetQuantity', 'must be a whole number of at least 1');
  }
}
