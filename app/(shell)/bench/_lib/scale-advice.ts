/**
 * Advice before the count: can this scale count this part, with what sample, and would another
 * scale of the bench serve better? Built on the same planning test as the grow step
 * (lib/weighing/exact-reach.ts), so the advice and the bench's later verdicts agree.
 */
import { exactReach, planningSpread, sampleForTarget, spreadNodes, type SpreadBelief } from '@/lib/weighing';
import { DEFAULT_SAMPLE_QUANTITY } from './sample-advice';

export interface AdvisedScale {
  id: number;
  name: string;
  division: number;
  repeatability: number;
  capacity: number;
  minLoad: number;
  locked: boolean;
}

export interface ScaleVerdict {
  scaleId: number;
  /** Can count the part at all (a piece above the division, one piece within reach, not locked). */
  usable: boolean;
  /** The target is within exact reach with `sample` pieces. */
  targetExact: boolean;
  /** Pieces to put on for the first sample: enough for the target where that is possible, never under Min. */
  sample: number;
  /** What stands in the way, in the operator's words; null when nothing does. */
  problem: string | null;
}

export interface Advice {
  here: ScaleVerdict;
  /** Another scale that would serve better, and why; null when this one is as good as any. */
  better: { scale: AdvisedScale; verdict: ScaleVerdict } | null;
}

const grams = (x: number): string => `${Number(x.toPrecision(3))} g`;

export function judgeScale(
  scale: AdvisedScale,
  part: { averagePieceWeight: number; spread: SpreadBelief },
  target: number | null,
  sampleOnPan: boolean,
  containerWeight = 0,
): ScaleVerdict {
  const apw = part.averagePieceWeight;
  const base = { scaleId: scale.id, usable: false, targetExact: false, sample: DEFAULT_SAMPLE_QUANTITY };
  if (scale.locked) return { ...base, problem: `${scale.name} is locked.` };
  if (apw < scale.division) return { ...base, problem: `One piece (${grams(apw)}) is lighter than ${scale.name}'s division of ${grams(scale.division)}.` };
  const c2 = planningSpread(spreadNodes(part.spread));
  const noise = { division: scale.division, repeatability: scale.repeatability };
  // A sample under Min may carry a large relative error (OIML R 76): never advise one.
  const minSample = Math.max(DEFAULT_SAMPLE_QUANTITY, Math.ceil(scale.minLoad / apw));
  const reach = exactReach({ sampleQuantity: minSample, averagePieceWeight: apw, sampleScale: noise, sampleOnPan }, c2);
  if (reach.tooLight) return { ...base, sample: minSample, problem: `${scale.name} cannot tell even one piece apart from its noise.` };
  if (minSample * apw + containerWeight > scale.capacity)
    return { ...base, sample: minSample, problem: `A sample of ${minSample} is over ${scale.name}'s Max.` };
  if (target == null) return { ...base, usable: true, sample: minSample, problem: null };
  if (target * apw + containerWeight > scale.capacity) {
    return {
      ...base,
      usable: true,
      sample: minSample,
      problem: `${target} pieces (${grams(target * apw)}) are over ${scale.name}'s Max of ${grams(scale.capacity)}: count them in batches.`,
    };
  }
  const needed = sampleForTarget({ targetQuantity: target, averagePieceWeight: apw, sampleScale: noise, sampleOnPan }, c2);
  if (needed == null) {
    return {
      ...base,
      usable: true,
      sample: minSample,
      problem: `${target} pieces cannot be counted exactly on ${scale.name} whatever the sample: grow it in steps, or count in smaller batches.`,
    };
  }
  return { scaleId: scale.id, usable: true, targetExact: true, sample: Math.min(target, Math.max(minSample, needed)), problem: null };
}

/** How good a verdict is: the target within reach beats not, usable beats not, a smaller sample beats a larger. */
function rank(v: ScaleVerdict): number {
  return (v.targetExact ? 2e9 : 0) + (v.usable ? 1e9 : 0) - v.sample;
}

export function adviseScales(
  scales: readonly AdvisedScale[],
  currentId: number,
  part: { averagePieceWeight: number; spread: SpreadBelief },
  target: number | null,
  sampleOnPan: boolean,
  containerWeight = 0,
): Advice | null {
  const current = scales.find((s) => s.id === currentId);
  if (!current) return null;
  const here = judgeScale(current, part, target, sampleOnPan, containerWeight);
  let better: Advice['better'] = null;
  for (const s of scales) {
    if (s.id === currentId) continue;
    const v = judgeScale(s, part, target, sampleOnPan, containerWeight);
    // Only a scale that removes a problem is worth the move.
    if (here.problem && !v.problem && rank(v) > rank(better?.verdict ?? here)) better = { scale: s, verdict: v };
  }
  return { here, better };
}
