/** What the bench says about the part's piece spread: how sure it is, and what a few more single pieces would buy. */
import { exactReach, planningSpread, spreadEstimate, spreadNodes, type SpreadBelief } from '@/lib/weighing';

/** Pieces an operator can put on one at a time without it becoming a chore (our choice). */
export const MORE_PIECES = 10;
const WORTHWHILE_GAIN = 1.1;

export interface SpreadNote {
  /** e.g. "Piece spread 1.8 % from 24 pieces one at a time". */
  headline: string;
  /** e.g. "10 more single pieces would let a sample of 10 count up to 240 exactly, not 150." */
  more: string | null;
}

const percent = (c: number): string => `${(c * 100).toFixed(c < 0.00995 ? 2 : 1)} %`;

export function describeSpread(input: {
  belief: SpreadBelief;
  noise: { division: number; repeatability: number };
  averagePieceWeight: number | null;
  sampleQuantity: number;
  sampleOnPan: boolean;
}): SpreadNote {
  const { belief } = input;
  const headline =
    belief.kind === 'learned'
      ? `Piece spread ${percent(spreadEstimate(belief))} from ${belief.observations} pieces`
      : `Piece spread not learned yet: ${percent(belief.pieceSpread)} is assumed, to be safe`;
  const apw = input.averagePieceWeight;
  if (apw == null || !(apw > 0) || belief.kind === 'known') return { headline, more: null };
  const model = { sampleQuantity: input.sampleQuantity, averagePieceWeight: apw, sampleScale: input.noise, sampleOnPan: input.sampleOnPan };
  const now = exactReach(model, planningSpread(spreadNodes(belief)));
  // With more pieces the scatter is taken to stay what it is (or, unlearned, to be the assumed value).
  const c2 = belief.kind === 'learned' ? belief.scatter : belief.pieceSpread ** 2;
  const noise = belief.kind === 'learned' ? belief.noise : 0;
  const observations = belief.kind === 'learned' ? belief.observations : 0;
  const nu = belief.kind === 'learned' ? belief.degreesOfFreedom : 0;
  const better: SpreadBelief = { kind: 'learned', scatter: c2, noise, degreesOfFreedom: nu + MORE_PIECES, observations: observations + MORE_PIECES };
  const then = exactReach(model, planningSpread(spreadNodes(better)));
  // Only a gain worth the operator's minute is offered: a tenth more reach at least (our choice).
  if (then.maxQuantity < Math.max(now.maxQuantity + 1, now.maxQuantity * WORTHWHILE_GAIN)) return { headline, more: null };
  const reach = (q: number): string => (q === 0 ? 'nothing' : `up to ${q}`);
  return {
    headline,
    more: `${MORE_PIECES} more pieces put on one at a time would let a sample of ${input.sampleQuantity} count ${reach(then.maxQuantity)} exactly, not ${reach(now.maxQuantity)}.`,
  };
}
