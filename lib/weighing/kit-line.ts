/**
 * A kit line's uncertainty from its captures (docs/counting-model.md, "Kit lines"). Captures that
 * use one APW share its error: each count's error holds −M_i·δ for the same relative APW error δ,
 * so their covariance is M_i·M_j·u_r(APW)² (JCGM 100:2008 5.2.2, correlated inputs); the rest of
 * each capture's variance is its own.
 */
import { COVERAGE_FACTOR } from './count-judgement';
import { toWholePieces } from './tolerance';

export interface LineCapture {
  count: number;
  exact: boolean;
  /** Half-width of the capture's 95 % interval (pieces). */
  expandedUncertainty: number;
  /** M: pieces whose count was uncertain. */
  uncertainPieces: number;
  /** u_r(APW)² of the APW the capture used. */
  apwRelativeVariance: number;
  /** Captures with the same key used the same APW (one sample). */
  apwKey: string;
}

export interface LineTotal {
  counted: number;
  /** u of the sum (pieces), the shared APW counted once per group. */
  standardUncertainty: number;
  expandedUncertainty: number;
  /** 0 when every capture was exact; otherwise at least 1. */
  wholePieceRange: number;
  exact: boolean;
}

export function combineLineCaptures(captures: readonly LineCapture[]): LineTotal {
  let own = 0;
  const shared = new Map<string, { pieces: number; relative: number }>();
  for (const c of captures) {
    const total = (c.expandedUncertainty / COVERAGE_FACTOR) ** 2;
    const fromApw = c.uncertainPieces ** 2 * c.apwRelativeVariance;
    own += Math.max(0, total - fromApw);
    const group = shared.get(c.apwKey) ?? { pieces: 0, relative: c.apwRelativeVariance };
    group.pieces += c.uncertainPieces;
    group.relative = Math.max(group.relative, c.apwRelativeVariance);
    shared.set(c.apwKey, group);
  }
  let variance = own;
  for (const group of shared.values()) variance += group.pieces ** 2 * group.relative;
  const standardUncertainty = Math.sqrt(variance);
  const expandedUncertainty = COVERAGE_FACTOR * standardUncertainty;
  const exact = captures.length > 0 && captures.every((c) => c.exact);
  return {
    counted: captures.reduce((sum, c) => sum + c.count, 0),
    standardUncertainty,
    expandedUncertainty,
    wholePieceRange: exact ? 0 : toWholePieces(expandedUncertainty),
    exact,
  };
}
