/**
 * How far a sample reaches before counts stop being exact, and the sample a target needs
 * (docs/counting-model.md, "Planning"). Advice must hold before the count is made, so it asks
 * for more than the judgement does: a count is *within reach* when a reading anywhere in the
 * central 90 % of its spread (|N̂ − N| ≤ 1.645·u) would still be judged exact, with the spread
 * taken at the belief's 95th percentile rather than averaged.
 */
import { EXACT_PROBABILITY } from './count-judgement';
import { countVariance, type CountModel, type WeighingScale } from './count-variance';
import { spreadQuantile, type SpreadNode } from './spread-belief';

/** Share of readings a plan allows for (central 90 %, z = 1.645; our choice). */
const PLAN_READING_Z = 1.645;
/** The spread a plan assumes: the belief's 95th percentile (our choice). */
export const PLAN_SPREAD_LEVEL: number = 0.95;

/**
 * The largest u at which a reading z·u from a whole count is still judged exact, for a single
 * normal spread: 1 − P ≈ exp(−(1 − 2x)/(2u²)) + exp(−(1 + 2x)/(2u²)), x = z·u, solved by bisection.
 */
function plannedStandardUncertainty(): number {
  const wrong = (u: number): number => {
    const x = PLAN_READING_Z * u;
    const near = Math.exp(-(1 - 2 * x) / (2 * u * u));
    const far = Math.exp(-(1 + 2 * x) / (2 * u * u));
    return (near + far) / (1 + near + far);
  };
  let lo = 0.01;
  let hi = 0.3;
  for (let i = 0; i < 60; i += 1) {
    const mid = (lo + hi) / 2;
    if (wrong(mid) <= 1 - EXACT_PROBABILITY) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** About 0.196 pieces for a 99 % exact judgement. */
export const PLANNED_STANDARD_UNCERTAINTY: number = plannedStandardUncertainty();

/** The c² a plan assumes. */
export function planningSpread(nodes: readonly SpreadNode[]): number {
  return spreadQuantile(nodes, PLAN_SPREAD_LEVEL);
}

export function withinReach(model: CountModel, count: number, c2: number): boolean {
  return countVariance(model, count, c2) <= PLANNED_STANDARD_UNCERTAINTY ** 2;
}

export interface ExactReach {
  /** Largest whole-pan count (on the pan) or bulk count (apart) within reach; 0 when too light. */
  maxQuantity: number;
  /** Not even one piece more than the sample (one piece apart) is within reach. */
  tooLight: boolean;
}

/** Largest count within reach, by doubling then bisection (u(N̂) grows with the count). */
export function exactReach(model: CountModel, c2: number): ExactReach {
  const first = model.sampleOnPan && !model.bulkScale ? model.sampleQuantity + 1 : 1;
  if (!withinReach(model, first, c2)) return { maxQuantity: 0, tooLight: true };
  let good = first;
  let bad = first * 2;
  while (bad < 1e12 && withinReach(model, bad, c2)) {
    good = bad;
    bad *= 2;
  }
  if (bad >= 1e12) return { maxQuantity: Number.MAX_SAFE_INTEGER, tooLight: false };
  while (bad - good > 1) {
    const mid = Math.floor((good + bad) / 2);
    if (withinReach(model, mid, c2)) good = mid;
    else bad = mid;
  }
  return { maxQuantity: good, tooLight: false };
}

export interface SampleForTarget {
  targetQuantity: number;
  averagePieceWeight: number;
  sampleScale: WeighingScale;
  bulkScale?: WeighingScale;
  sampleOnPan: boolean;
  /** Largest sample worth proposing; default T − 1 on the pan, T apart. */
  maxSample?: number;
}

/**
 * Smallest sample n that puts the target within reach, with W_s = n·APW; null when none up to
 * maxSample does (the c²·M term alone may be too large). u falls as n grows, so bisection works.
 */
export function sampleForTarget(input: SampleForTarget, c2: number): number | null {
  const t = Math.floor(input.targetQuantity);
  const onPan = input.sampleOnPan && !input.bulkScale;
  const cap = onPan ? t - 1 : t;
  const hi0 = Math.floor(Math.min(input.maxSample ?? cap, cap));
  const reaches = (n: number): boolean =>
    withinReach(
      {
        sampleQuantity: n,
        averagePieceWeight: input.averagePieceWeight,
        sampleScale: input.sampleScale,
        bulkScale: input.bulkScale,
        sampleOnPan: input.sampleOnPan,
      },
      t,
      c2,
    );
  if (t < 1 || hi0 < 1 || !reaches(hi0)) return null;
  let lo = 1;
  let hi = hi0;
  while (lo < hi) {
    const mid = Math.floor((lo + hi) / 2);
    if (reaches(mid)) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}
