/**
 * What is known about a part's piece spread c = σ/μ, with its own uncertainty
 * (docs/counting-model.md, "The piece spread and how sure it is").
 *
 * Single-piece increments x_i (one piece put on at a time) scatter with E[s²] = μ²c² + v_noise.
 * With ν = m − 1 degrees of freedom, τ² = E[s²] given the observed s² is taken as ν·s²/X with
 * X ~ χ²_k: the posterior of a normal variance (JCGM 101:2008 6.4.9 treats a Type A evaluation this
 * way; from memory). Under the usual prior 1/τ², k = ν; we take a prior flat in τ², k = ν − 2 (at
 * least 1), which keeps more belief on large spreads: with 5 pieces, a scatter that came out small
 * by chance must not make counts "exact" for a part that is in truth loose (our choice; a false
 * exact costs more than a wide interval). c² = (τ² − v_noise)/μ² with τ² cut at the noise: the
 * reading noise is taken off with the rest of the uncertainty, never by a gate. A count then
 * averages over this belief (count-judgement.ts).
 */
import type { ReadingNoise } from './rounding-covariance';
import { indicationVariance } from './uncertainty';

/**
 * Used for a part whose spread is not known: cautious enough that counts stay right for true
 * spreads up to 5 % (springs, moulded plastic, wire forms are the loose end; common practice).
 */
export const ASSUMED_PIECE_SPREAD: number = 0.05;

/** Spreads above 50 % are not countable by weight at all; the belief's far tail is cut there. */
export const LARGEST_SPREAD: number = 0.5;

export type SpreadBelief =
  /** Given as a number taken to be well known. */
  | { kind: 'known'; pieceSpread: number }
  /**
   * Learned: relative scatter s²/μ² of the observations, the relative noise variance in it,
   * and the degrees of freedom ν (from `observations` pieces).
   */
  | { kind: 'learned'; scatter: number; noise: number; degreesOfFreedom: number; observations: number }
  /** Not known: a conservative value stands in for it (`cv_assumed`). */
  | { kind: 'assumed'; pieceSpread: number };

export interface SpreadNode {
  /** c² at this node. */
  c2: number;
  /** Its share of the belief (all nodes add up to 1). */
  weight: number;
}

const MAX_NODES = 120;
/** Nodes whose share is below this cannot move a 1 % judgement. */
const NEGLIGIBLE = 1e-8;

/** c² for a value X of χ²_ν. */
function c2At(belief: Extract<SpreadBelief, { kind: 'learned' }>, x: number): number {
  const tau2 = (belief.degreesOfFreedom * belief.scatter) / x;
  return Math.min(LARGEST_SPREAD ** 2, Math.max(0, tau2 - belief.noise));
}

/**
 * The belief as weighted values of c². A known or assumed spread is one node. A learned one is
 * integrated over X ~ χ²_k on t = ln X, where the density X·p(X) ∝ exp(kt/2 − eᵗ/2) is smooth,
 * with the trapezoid rule; the range reaches far into the small-X tail, where the large spreads
 * that make a count go wrong live. Since τ² = μ²c² + v_noise cannot be below the noise, the
 * belief is cut there (X ≤ ν·s²/v_noise) and renormalised, rather than piling every τ² below the
 * noise onto c = 0: scatter that is all noise says "somewhere below what this scale can see",
 * not "no spread at all".
 */
export function spreadNodes(belief: SpreadBelief): SpreadNode[] {
  if (belief.kind !== 'learned') return [{ c2: belief.pieceSpread ** 2, weight: 1 }];
  const nu = belief.degreesOfFreedom;
  const k = Math.max(1, nu - 2);
  // Scatter of exactly 0 (identical rounded increments) tells no more than scatter at the noise/ν level.
  const scatter = Math.max(belief.scatter, belief.noise / nu, Number.MIN_VALUE);
  const learned = { ...belief, scatter };
  // The left tail of ln X falls as exp(k·t/2): 30/k + 6/√k below the mode it is below 1e-6.
  const tail = 30 / k + 6 / Math.sqrt(k);
  const cut = belief.noise > 0 ? Math.log((nu * scatter) / belief.noise) : Infinity;
  const hi = Math.min(Math.log(k + 12 * Math.sqrt(2 * k) + 30), cut);
  const lo = Math.min(Math.log(k) - tail, hi - tail);
  // A step of about 0.8 standard deviations of ln X (√(2/k + 4/k²) roughly) makes the trapezoid
  // error far below 1e-6 for a bell this smooth; where the cut ends the range abruptly, the error
  // is of order step² there, small against the judgement's 1 %.
  const step0 = Math.min(1, 0.8 * Math.sqrt(2 / k + 4 / (k * k)));
  const count = Math.min(MAX_NODES, Math.ceil((hi - lo) / step0) + 1);
  const step = (hi - lo) / (count - 1);
  const nodes: SpreadNode[] = [];
  let total = 0;
  for (let i = 0; i < count; i += 1) {
    const t = lo + i * step;
    const logDensity = (k / 2) * (t - Math.log(k)) - (Math.exp(t) - k) / 2;
    const weight = Math.exp(logDensity) * (i === 0 || i === count - 1 ? 0.5 : 1);
    total += weight;
    const c2 = c2At(learned, Math.exp(t));
    // Nodes at one c² (the cut far tail) are one node.
    const last = nodes[nodes.length - 1];
    if (last && last.c2 === c2) last.weight += weight;
    else nodes.push({ c2, weight });
  }
  for (const node of nodes) node.weight /= total;
  return nodes.filter((node) => node.weight > NEGLIGIBLE);
}

/** The c² that the belief exceeds with probability 1 − level (its upper quantile), from the nodes. */
export function spreadQuantile(nodes: readonly SpreadNode[], level: number): number {
  const sorted = [...nodes].sort((a, b) => a.c2 - b.c2);
  let cumulative = 0;
  for (const node of sorted) {
    cumulative += node.weight;
    if (cumulative >= level) return node.c2;
  }
  return sorted[sorted.length - 1].c2;
}

/** The point estimate ĉ (what the bench shows as "spread 1.8 %"). */
export function spreadEstimate(belief: SpreadBelief): number {
  if (belief.kind !== 'learned') return belief.pieceSpread;
  return Math.sqrt(Math.min(LARGEST_SPREAD ** 2, Math.max(0, belief.scatter - belief.noise)));
}

/** A spread given by a caller with its degrees of freedom (absent: well known). */
export function givenSpread(pieceSpread: number, degreesOfFreedom?: number): SpreadBelief {
  if (degreesOfFreedom == null) return { kind: 'known', pieceSpread };
  return { kind: 'learned', scatter: pieceSpread ** 2, noise: 0, degreesOfFreedom, observations: degreesOfFreedom + 1 };
}

/**
 * Learns from single-piece increments read on one scale. Consecutive increments share a reading,
 * so the noise in their sample variance is 2(d²/12 + s_r²)·(1 + 1/m) (the differences of m + 1
 * readings), relative to the mean increment squared. Null below two increments or a mean ≤ 0.
 */
export function spreadFromIncrements(increments: readonly number[], noise: ReadingNoise): SpreadBelief | null {
  const m = increments.length;
  if (m < 2) return null;
  const mean = increments.reduce((sum, x) => sum + x, 0) / m;
  if (!(mean > 0)) return null;
  const ss = increments.reduce((sum, x) => sum + (x - mean) ** 2, 0);
  return {
    kind: 'learned',
    scatter: ss / (m - 1) / mean ** 2,
    noise: (2 * indicationVariance(noise) * (1 + 1 / m)) / mean ** 2,
    degreesOfFreedom: m - 1,
    observations: m,
  };
}

/** Pools learned beliefs (several samples built piece by piece): degrees of freedom add. */
export function poolSpreads(beliefs: readonly SpreadBelief[]): SpreadBelief | null {
  const learned = beliefs.filter((b): b is Extract<SpreadBelief, { kind: 'learned' }> => b.kind === 'learned');
  const nu = learned.reduce((sum, b) => sum + b.degreesOfFreedom, 0);
  if (nu === 0) return null;
  const weighted = (pick: (b: Extract<SpreadBelief, { kind: 'learned' }>) => number): number =>
    learned.reduce((sum, b) => sum + b.degreesOfFreedom * pick(b), 0) / nu;
  return {
    kind: 'learned',
    scatter: weighted((b) => b.scatter),
    noise: weighted((b) => b.noise),
    degreesOfFreedom: nu,
    observations: learned.reduce((sum, b) => sum + b.observations, 0),
  };
}

export interface SampleRecord {
  quantity: number;
  /** APW of that sample (g). */
  averagePieceWeight: number;
  /** Variance of that sample's net weight (g²), from its scale. */
  netVariance: number;
}

/**
 * Learns from the APWs of whole samples over time (none built piece by piece):
 * n_i·Var(APW_i) = μ²c² + u(W_i)²/n_i, so Σ n_i(APW_i − μ̄)²/(K − 1) with μ̄ the n-weighted mean
 * estimates μ²c² plus the mean of u(W_i)²/n_i, the noise. ν = K − 1. Lot-to-lot drift inflates it,
 * which errs on the safe side. Null below two samples.
 */
export function spreadFromSamples(samples: readonly SampleRecord[]): SpreadBelief | null {
  const k = samples.length;
  if (k < 2) return null;
  const totalN = samples.reduce((sum, s) => sum + s.quantity, 0);
  const mean = samples.reduce((sum, s) => sum + s.quantity * s.averagePieceWeight, 0) / totalN;
  if (!(mean > 0)) return null;
  const weightedSs = samples.reduce((sum, s) => sum + s.quantity * (s.averagePieceWeight - mean) ** 2, 0);
  const noise = samples.reduce((sum, s) => sum + s.netVariance / s.quantity, 0) / k;
  return { kind: 'learned', scatter: weightedSs / (k - 1) / mean ** 2, noise: noise / mean ** 2, degreesOfFreedom: k - 1, observations: totalN };
}
