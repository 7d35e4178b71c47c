/**
 * How sure a count is, over whole numbers of pieces (docs/counting-model.md, "Exact").
 *
 * For a reading N̂ the chance that the true count is k is taken as proportional to the density of
 * N̂ given k, averaged over the spread belief: Σ_j w_j·φ((N̂ − k)/u_kj)/u_kj, with u_kj² the count
 * variance at k for the belief's node j (a flat prior over whole counts). So u is judged at each
 * candidate count, not at N̂ (an undercount cannot borrow the smaller u of a smaller count), and
 * N̂ half-way between two counts can never be more than 50 % sure of either.
 */
import { countStep, countVariance, uncertainPiecesOf, type CountModel } from './count-variance';
import { normalDensity, twoSidedTail } from './normal';
import type { SpreadNode } from './spread-belief';
import { toWholePieces } from './tolerance';

/** A count is exact when the chance that it is the true count is at least this (our choice; the target is 99 % right). */
export const EXACT_PROBABILITY: number = 0.99;

/** k = 2 for a well-known spread (about 95 %, JCGM 100:2008 6.3.3); the same coverage, 95.45 %, otherwise. */
export const COVERAGE_FACTOR: number = 2;
const COVERAGE = 1 - twoSidedTail(COVERAGE_FACTOR);

/** A reading further than this from every whole count by chance alone is rare: 3 standard uncertainties (0.27 %). */
export const WHOLE_PIECE_P_VALUE: number = twoSidedTail(3);

export interface CountJudgement {
  /** round(N̂), from the unrounded N̂. */
  count: number;
  /** Chance that `count` is the true count. */
  probabilityExact: number;
  exact: boolean;
  /** The count is within ± this many whole pieces with 95 % (0 exactly when exact). */
  wholePieceRange: number;
  /** u(N̂) at the spread's point estimate (pieces). */
  standardUncertainty: number;
  /**
   * Half-width of the 95.45 % interval around N̂, over the whole spread belief, plus half the step
   * N̂ moves in when one reading moves by a division (pieces).
   */
  expandedUncertainty: number;
  /** Chance of a reading at least this far from `count` if `count` were true (small: not whole pieces). */
  wholePiecePValue: number;
  /** Pieces whose count is uncertain at N̂. */
  uncertainPieces: number;
}

function sdAt(model: CountModel, count: number, nodes: readonly SpreadNode[]): number[] {
  return nodes.map((node) => Math.sqrt(countVariance(model, Math.max(0, count), node.c2)));
}

/** Half-width h with Σ_j w_j·P(|N(0, u_j²)| ≤ h) = coverage, by bisection (one node: k·u). */
function mixtureHalfWidth(nodes: readonly SpreadNode[], sds: readonly number[]): number {
  if (nodes.length === 1) return COVERAGE_FACTOR * sds[0];
  let lo = 0;
  let hi = COVERAGE_FACTOR * Math.max(...sds);
  for (let i = 0; i < 40 && hi - lo > 1e-6 * hi; i += 1) {
    const mid = (lo + hi) / 2;
    const covered = nodes.reduce((sum, node, j) => sum + node.weight * (1 - twoSidedTail(mid / sds[j])), 0);
    if (covered < COVERAGE) lo = mid;
    else hi = mid;
  }
  return hi;
}

/** Past this U (pieces) no whole count can be 1 % sure, and the chances are those of a smooth curve. */
const WIDE = 6;

/**
 * `cautiousSpread2` is c² at the belief's upper percentile: the chance a count is reported with is
 * the lower of the belief's average and the chance at that spread. The average alone is right on
 * average over spreads; for a part whose true spread sits high in the belief (a learned spread that
 * came out small by chance), a reading that lands on a whole number would otherwise look surer than
 * it is.
 */
export function judgeCount(
  model: CountModel,
  countRaw: number,
  nodes: readonly SpreadNode[],
  pointSpread2: number,
  cautiousSpread2: number = pointSpread2,
): CountJudgement {
  const count = Math.max(0, Math.round(countRaw));
  const atRaw = sdAt(model, countRaw, nodes);
  // N̂ moves in steps of a division: a value known only to a step has an interval of half the step
  // (as GUM F.2.2.1 treats a resolution), which the normal part cannot supply where steps are coarse.
  const expandedUncertainty = mixtureHalfWidth(nodes, atRaw) + countStep(model, countRaw) / 2;
  const standardUncertainty = Math.sqrt(countVariance(model, Math.max(0, countRaw), pointSpread2));
  const offset = Math.abs(countRaw - count);
  const uncertainPieces = uncertainPiecesOf(model, countRaw);
  if (expandedUncertainty > WIDE) {
    // A wide count: the chance of one whole number is the density of N̂'s spread there, times one piece.
    const density = nodes.reduce((sum, node, j) => sum + (node.weight * normalDensity(offset / atRaw[j])) / atRaw[j], 0);
    const wholePiecePValue = nodes.reduce((sum, node, j) => sum + node.weight * twoSidedTail(offset / atRaw[j]), 0);
    return {
      count,
      probabilityExact: Math.min(1, density),
      exact: false,
      wholePieceRange: toWholePieces(expandedUncertainty),
      standardUncertainty,
      expandedUncertainty,
      wholePiecePValue,
      uncertainPieces,
    };
  }
  const window = Math.ceil(1.5 * expandedUncertainty) + 2;
  const chance = chancesOverCounts(model, countRaw, count, window, nodes, atRaw);
  const cautious =
    nodes.length === 1 && nodes[0].c2 === cautiousSpread2
      ? chance
      : chancesOverCounts(model, countRaw, count, window, [{ c2: cautiousSpread2, weight: 1 }], sdAt(model, countRaw, [{ c2: cautiousSpread2, weight: 1 }]));
  const probabilityExact = Math.min(chance(count), cautious(count));
  const sdsAtCount = sdAt(model, count, nodes);
  const wholePiecePValue = nodes.reduce((sum, node, j) => sum + node.weight * twoSidedTail(offset / sdsAtCount[j]), 0);
  // A reading that fits no whole count is not exact however the neighbours compare: at N̂ = k + ½
  // with a tiny u, the slightly larger u of k + 1 alone would otherwise make k + 1 "sure".
  const exact = probabilityExact >= EXACT_PROBABILITY && wholePiecePValue >= WHOLE_PIECE_P_VALUE;
  return {
    count,
    probabilityExact,
    exact,
    wholePieceRange: exact ? 0 : wholePieceRangeOf(chance, count, window, expandedUncertainty),
    standardUncertainty,
    expandedUncertainty,
    wholePiecePValue,
    uncertainPieces,
  };
}

/** P(true count = k | N̂) over whole counts near `count`, for one belief (0 outside the window). */
function chancesOverCounts(
  model: CountModel,
  countRaw: number,
  count: number,
  window: number,
  nodes: readonly SpreadNode[],
  atRaw: readonly number[],
): (k: number) => number {
  const lo = Math.max(0, count - window);
  const hi = count + window;
  const likelihood: number[] = [];
  let inWindow = 0;
  for (let k = lo; k <= hi; k += 1) {
    const sds = sdAt(model, k, nodes);
    const l = nodes.reduce((sum, node, j) => sum + (node.weight * normalDensity((countRaw - k) / sds[j])) / sds[j], 0);
    likelihood.push(l);
    inWindow += l;
  }
  // Counts beyond the window: their likelihood, summed, is about the continuous mass out there.
  const beyond = nodes.reduce((sum, node, j) => {
    const below = lo === 0 ? 0 : twoSidedTail((countRaw - (lo - 0.5)) / atRaw[j]) / 2;
    const above = twoSidedTail((hi + 0.5 - countRaw) / atRaw[j]) / 2;
    return sum + node.weight * (below + above);
  }, 0);
  const total = inWindow + beyond;
  return (k) => (total > 0 && k >= lo && k <= hi ? likelihood[k - lo] / total : 0);
}

/** Smallest h ≥ 1 with P(|N − count| ≤ h) ≥ 95.45 %; past the window, U in whole pieces. */
function wholePieceRangeOf(chance: (k: number) => number, count: number, window: number, expanded: number): number {
  let covered = chance(count);
  for (let h = 1; h <= window; h += 1) {
    covered += chance(count - h) + chance(count + h);
    if (covered >= COVERAGE) return h;
  }
  return Math.max(window + 1, toWholePieces(expanded));
}
