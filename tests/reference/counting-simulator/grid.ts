/**
 * The regime grid for the counting simulator, a runner that drives an estimate adapter through a
 * regime, and the judgement of one regime's tallies (Monte Carlo validation of a stated coverage
 * interval, JCGM 101:2008 §8, from memory: the interval's coverage is checked by simulation).
 */
import {
  Rng,
  hashString,
  simulateTrial,
  type EstimateResponse,
  type Estimator,
  type Geometry,
  type Regime,
  type SpreadKnowledge,
  type Trial,
} from './simulator';

// ---------------------------------------------------------------------------------------------
// The grid

export const SPREADS = [0.001, 0.005, 0.01, 0.02, 0.05];
export const KNOWLEDGE: SpreadKnowledge[] = ['known', 'learned5', 'learned10', 'learned25', 'unknown'];
export const SAMPLE_QUANTITIES = [5, 10, 25, 100];
export const QUANTITIES = [50, 200, 1000, 5000];
export const DIVISIONS = [0.001, 0.01, 0.1, 1];
/**
 * Generic, not round piece weights over 0.05–50 g. Against the divisions they give μ/d from 0.05
 * to 47 000, including 1.618 (0.1618 g on 0.1 g) between d and 2d, 2.72 (2.7183 g on 1 g) just
 * resolved, and 0.054–0.54 below one division.
 */
export const APWS = [0.0537, 0.1618, 2.7183, 47.31];
/** s_r: none (every reading is its load rounded, the hardest case for a normal model) or d/2. */
export type RepeatabilityLevel = 'zero' | 'halfDivision';
export const REPEATABILITY_LEVELS: RepeatabilityLevel[] = ['zero', 'halfDivision'];
export const GEOMETRIES: Geometry[] = ['onPan', 'apart'];

function repeatabilityOf(level: RepeatabilityLevel, d: number): number {
  return level === 'zero' ? 0 : Number((d / 2).toFixed(6));
}

export function makeRegime(p: {
  spread: number;
  knowledge: SpreadKnowledge;
  n: number;
  N: number;
  d: number;
  apw: number;
  sr: RepeatabilityLevel;
  geometry: Geometry;
}): Regime {
  return {
    spread: p.spread,
    knowledge: p.knowledge,
    sampleQuantity: p.n,
    quantity: p.N,
    division: p.d,
    apw: p.apw,
    repeatability: repeatabilityOf(p.sr, p.d),
    geometry: p.geometry,
  };
}

/** A stable name: also the seed's source, so a regime's draws do not depend on its place in a list. */
export function regimeKey(r: Regime): string {
  const sr = r.repeatability === 0 ? '0' : 'd/2';
  return `c=${r.spread} ${r.knowledge} n=${r.sampleQuantity} N=${r.quantity} d=${r.division} mu=${r.apw} sr=${sr} ${r.geometry}`;
}

/** (n, N) pairs with N > n. */
function samplePairs(): [number, number][] {
  const pairs: [number, number][] = [];
  for (const n of SAMPLE_QUANTITIES) for (const N of QUANTITIES) if (N > n) pairs.push([n, N]);
  return pairs;
}

/** Every combination: 5 c × 5 knowledge × 15 (n, N) × 4 d × 4 μ × 2 s_r × 2 geometries = 24 000. */
export function fullGrid(): Regime[] {
  const grid: Regime[] = [];
  for (const spread of SPREADS)
    for (const knowledge of KNOWLEDGE)
      for (const [n, N] of samplePairs())
        for (const d of DIVISIONS)
          for (const apw of APWS)
            for (const sr of REPEATABILITY_LEVELS) for (const geometry of GEOMETRIES) grid.push(makeRegime({ spread, knowledge, n, N, d, apw, sr, geometry }));
  return grid;
}

/**
 * A stratified subset (~150 regimes):
 * - every (c, knowledge, s_r, geometry) stratum once, with (n, N) and (d, μ) stepped through their
 *   lists by strides co-prime to their lengths, so every value of each appears;
 * - the hard cases: c = 5 % with the spread unknown or learned from 5 increments, n = 5, s_r = 0
 *   and d/2, at μ between d and 2d, just resolved (2.7 d) and comfortable (270 d);
 * - μ between d and 2d for every knowledge mode at c = 1 %, and a few pieces below d (unresolved);
 * - a few easy regimes, where any failure is a plain bug.
 */
export function quickGrid(): Regime[] {
  const chosen = new Map<string, Regime>();
  const add = (r: Regime): void => void chosen.set(regimeKey(r), r);
  const pairs = samplePairs();
  const scales: [number, number][] = [];
  for (const d of DIVISIONS) for (const apw of APWS) scales.push([d, apw]);
  let i = 0;
  for (const spread of SPREADS)
    for (const knowledge of KNOWLEDGE)
      for (const sr of REPEATABILITY_LEVELS)
        for (const geometry of GEOMETRIES) {
          const [n, N] = pairs[(i * 7) % pairs.length];
          const [d, apw] = scales[(i * 5) % scales.length];
          add(makeRegime({ spread, knowledge, n, N, d, apw, sr, geometry }));
          i += 1;
        }
  const between: [number, number] = [0.1, 0.1618]; // d ≤ μ < 2d
  const hardScales: [number, number][] = [between, [1, 2.7183], [0.01, 2.7183]];
  for (const knowledge of ['unknown', 'learned5'] as SpreadKnowledge[])
    for (const sr of REPEATABILITY_LEVELS)
      for (const [d, apw] of hardScales) for (const geometry of GEOMETRIES) add(makeRegime({ spread: 0.05, knowledge, n: 5, N: 1000, d, apw, sr, geometry }));
  for (const knowledge of KNOWLEDGE)
    for (const geometry of GEOMETRIES) add(makeRegime({ spread: 0.01, knowledge, n: 5, N: 200, d: between[0], apw: between[1], sr: 'zero', geometry }));
  for (const geometry of GEOMETRIES)
    for (const [d, apw] of [
      [1, 0.1618],
      [1, 0.0537],
    ] as [number, number][])
      add(makeRegime({ spread: 0.02, knowledge: 'known', n: 25, N: 200, d, apw, sr: 'halfDivision', geometry }));
  for (const geometry of GEOMETRIES)
    for (const spread of [0.001, 0.005]) {
      add(makeRegime({ spread, knowledge: 'known', n: 25, N: 200, d: 0.01, apw: 2.7183, sr: 'halfDivision', geometry }));
      add(makeRegime({ spread, knowledge: 'learned25', n: 100, N: 5000, d: 0.001, apw: 47.31, sr: 'halfDivision', geometry }));
    }
  return [...chosen.values()];
}

/**
 * Trials for every quick-grid regime: enough for check (c) to be able to fail at all (more than
 * ~1 800 answers, see judgeRegime) and for (a) and (b) to catch a rate a few points off; at the
 * product's 0.05–0.8 ms a call (measured while it was being rewritten) the grid takes 20–60 s.
 */
export const QUICK_TRIALS = 2400;

/**
 * Resolved: μ ≥ 2d (our rule, from the physics alone). A net is the difference of two rounded
 * readings, so rounding alone moves it by up to ±d (a triangular error). At μ ≥ 2d that is at
 * most half a piece: rounding can never carry a one-piece change across the half-piece boundary
 * to a neighbouring count, and the error of a net is a smooth enough mixture for a GUM-style
 * normal interval to be judged. Below that, the sample's net takes only a few rounded values and
 * its error is far from normal (JCGM 100 G.6.6, from memory: the normal coverage factor needs a
 * near-normal output), so a ±U interval is not held to 95 % there.
 */
export function isResolved(r: Regime): boolean {
  return r.apw >= 2 * r.division;
}

/**
 * The count moves in steps: one division of the sample's net moves N̂ by (N/n)·d/μ pieces, one of the
 * load's by d/μ. Where the larger step exceeds the count's own smooth scatter from the pieces,
 * c·√(M + M²/n) (M the pieces not in the sample), N̂ − N takes a few values only (our rule, from the
 * physics alone). Such an error is bounded, not normal: an interval of ±2 standard deviations holds
 * all of a two- or three-point distribution (JCGM 101:2008 5.3 on coverage intervals of non-normal
 * outputs, from memory), so a coverage near 100 % says nothing about the interval being too wide there.
 */
export function movesInSteps(r: Regime): boolean {
  const m = r.geometry === 'onPan' ? r.quantity - r.sampleQuantity : r.quantity;
  const step = Math.max(1, r.quantity / r.sampleQuantity) * (r.division / r.apw);
  return step > r.spread * Math.sqrt(m + (m * m) / r.sampleQuantity);
}

/** One seed per (base seed, regime), from the regime's name: the same draws in any list or worker. */
export function regimeSeed(baseSeed: number, r: Regime): number {
  return baseSeed * 4294967296 + hashString(regimeKey(r));
}

// ---------------------------------------------------------------------------------------------
// Tallies

export interface Tally {
  trials: number;
  /** Not sent: the sample (or load) read 0 or less, which the contract refuses. */
  unsendable: number;
  /** The adapter threw, or answered with an error status. */
  errors: number;
  firstError: string | null;
  firstUnsendable: string | null;
  /** Sent and answered: the base of the coverage rates. */
  answered: number;
  flaggedExact: number;
  exactRight: number;
  intervalCovers: number;
  /** Answers carrying wholePieceRange, and how many of those cover the truth. */
  wholePieceAnswered: number;
  wholePieceCovers: number;
  probabilityExactSum: number;
  probabilityExactAnswered: number;
  /** Answers carrying each warning code. */
  warnings: Record<string, number>;
}

export function emptyTally(): Tally {
  return {
    trials: 0,
    unsendable: 0,
    errors: 0,
    firstError: null,
    firstUnsendable: null,
    answered: 0,
    flaggedExact: 0,
    exactRight: 0,
    intervalCovers: 0,
    wholePieceAnswered: 0,
    wholePieceCovers: 0,
    probabilityExactSum: 0,
    probabilityExactAnswered: 0,
    warnings: {},
  };
}

const isNumber = (x: unknown): x is number => typeof x === 'number' && Number.isFinite(x);

/** An error answer from an HTTP-shaped adapter: a status 'error' or ≥ 400, or an error field. */
function errorOf(response: EstimateResponse): string | null {
  const { status, error } = response;
  if (status === 'error' || (isNumber(status) && status >= 400) || error != null) {
    return `status ${String(status)}: ${typeof error === 'string' ? error : JSON.stringify(error ?? response)}`;
  }
  return null;
}

function recordError(t: Tally, message: string): void {
  t.errors += 1;
  t.firstError ??= message;
}

/** Adds one answered trial to the tally. */
export function recordResponse(t: Tally, truth: number, response: EstimateResponse): void {
  const failed = errorOf(response);
  if (failed) return recordError(t, failed);
  t.answered += 1;
  const { count, countRaw, expandedUncertainty: u, exact, probabilityExact, wholePieceRange } = response;
  if (exact === true) {
    t.flaggedExact += 1;
    if (count === truth) t.exactRight += 1;
  }
  if (isNumber(countRaw) && isNumber(u) && countRaw - u <= truth && truth <= countRaw + u) t.intervalCovers += 1;
  if (isNumber(wholePieceRange)) {
    t.wholePieceAnswered += 1;
    if (isNumber(count) && Math.abs(count - truth) <= wholePieceRange) t.wholePieceCovers += 1;
  }
  if (isNumber(probabilityExact)) {
    t.probabilityExactSum += probabilityExact;
    t.probabilityExactAnswered += 1;
  }
  for (const w of response.warnings ?? []) t.warnings[w.code] = (t.warnings[w.code] ?? 0) + 1;
}

/** Sends one simulated trial through the adapter and tallies it (HTTP callers can await per trial). */
export function runTrial(t: Tally, trial: Trial, estimate: Estimator): void {
  t.trials += 1;
  if (trial.unsendable) {
    t.unsendable += 1;
    t.firstUnsendable ??= trial.unsendable;
    return;
  }
  let response: EstimateResponse;
  try {
    response = estimate(trial.request);
  } catch (e) {
    return recordError(t, e instanceof Error ? `${e.name}: ${e.message}` : String(e));
  }
  recordResponse(t, trial.truth, response);
}

export function mergeTallies(a: Tally, b: Tally): Tally {
  const warnings: Record<string, number> = { ...a.warnings };
  for (const [code, k] of Object.entries(b.warnings)) warnings[code] = (warnings[code] ?? 0) + k;
  return {
    trials: a.trials + b.trials,
    unsendable: a.unsendable + b.unsendable,
    errors: a.errors + b.errors,
    firstError: a.firstError ?? b.firstError,
    firstUnsendable: a.firstUnsendable ?? b.firstUnsendable,
    answered: a.answered + b.answered,
    flaggedExact: a.flaggedExact + b.flaggedExact,
    exactRight: a.exactRight + b.exactRight,
    intervalCovers: a.intervalCovers + b.intervalCovers,
    wholePieceAnswered: a.wholePieceAnswered + b.wholePieceAnswered,
    wholePieceCovers: a.wholePieceCovers + b.wholePieceCovers,
    probabilityExactSum: a.probabilityExactSum + b.probabilityExactSum,
    probabilityExactAnswered: a.probabilityExactAnswered + b.probabilityExactAnswered,
    warnings,
  };
}

/** `trials` simulated counts of one regime through `estimate`, from a seed of the caller's. */
export function runRegime(regime: Regime, trials: number, seed: number, estimate: Estimator): Tally {
  const rng = new Rng(seed);
  const tally = emptyTally();
  for (let i = 0; i < trials; i += 1) runTrial(tally, simulateTrial(rng, regime), estimate);
  return tally;
}

// ---------------------------------------------------------------------------------------------
// Judgement

/**
 * Wilson score interval for a proportion (Wilson 1927, JASA 22:209; formula from memory).
 * Empty when n = 0: [0, 1].
 */
export function wilsonInterval(successes: number, n: number, z: number): { lower: number; upper: number } {
  if (n === 0) return { lower: 0, upper: 1 };
  const p = successes / n;
  const z2 = z * z;
  const centre = (p + z2 / (2 * n)) / (1 + z2 / n);
  const half = (z / (1 + z2 / n)) * Math.sqrt((p * (1 - p)) / n + z2 / (4 * n * n));
  return { lower: Math.max(0, centre - half), upper: Math.min(1, centre + half) };
}

/** ln C(n, k) by summing logs: exact enough for the binomial tails below (n of a few thousand). */
function logChoose(n: number, k: number): number {
  let sum = 0;
  for (let i = 1; i <= k; i += 1) sum += Math.log((n - k + i) / i);
  return sum;
}

/** P(X ≤ k) for X ~ Binomial(n, p). */
function binomialCdf(k: number, n: number, p: number): number {
  if (p <= 0) return 1;
  if (p >= 1) return k >= n ? 1 : 0;
  let sum = 0;
  for (let i = 0; i <= k; i += 1) sum += Math.exp(logChoose(n, i) + i * Math.log(p) + (n - i) * Math.log(1 - p));
  return Math.min(1, sum);
}

/**
 * Clopper–Pearson upper bound (Clopper and Pearson 1934, Biometrika 26:404; from memory): the p at
 * which seeing `successes` or fewer of n has chance α. Exact for any n, so one wrong count among a
 * handful of flagged ones does not fail a regime that chance alone explains (the Wilson bound does).
 */
export function clopperPearsonUpper(successes: number, n: number, alpha: number): number {
  if (n === 0 || successes >= n) return 1;
  let lo = successes / n;
  let hi = 1;
  for (let i = 0; i < 60; i += 1) {
    const mid = (lo + hi) / 2;
    if (binomialCdf(successes, n, mid) > alpha) lo = mid;
    else hi = mid;
  }
  return hi;
}

/** One-sided tail of a standard normal at z = 3 (0.135 %), the same allowance as the Wilson bounds. */
const ALPHA_AT_Z3 = 0.00135;

/** Limits (the product's goals as briefed) and the allowance for chance. */
export const LIMITS = { exactRight: 0.99, minCoverage: 0.93, maxCoverage: 0.995 };
/**
 * z = 3: a regime is failed only when even the optimistic end of a 3-sigma Wilson interval misses
 * its limit, so chance alone rarely fails a good regime while a rate plainly off still fails once
 * there are trials enough. The Wilson interval, unlike p ± z·√(p(1−p)/n), stays inside [0, 1] and
 * does not collapse to a point when no trial failed (common practice).
 * Caveat, measured (binomial tails): the Wilson bound is not exact for few trials near a rate of 1.
 * A regime whose true exact-right rate is exactly 99 % fails by chance with probability 0.3–0.5 %
 * when it has 200–2 000 flagged-exact trials, not the 0.13 % of a 3-sigma normal tail, and 2–5 %
 * with 2–5 of them (one wrong among ≤ 5 already fails). At a true 99.5 % this drops to 0.1–2.5 %
 * with few trials and below 1e-4 beyond 200.
 */
export const ALLOWANCE_Z = 3;

export interface Rates {
  /** Of sent trials, the share answered with exact: true. */
  flaggedExactRate: number | null;
  /** Of flagged-exact trials, the share whose count is the truth. */
  exactRightRate: number | null;
  intervalCoverage: number | null;
  wholePieceCoverage: number | null;
  probabilityExactMean: number | null;
}

const ratio = (a: number, b: number): number | null => (b > 0 ? a / b : null);

export function ratesOf(t: Tally): Rates {
  return {
    flaggedExactRate: ratio(t.flaggedExact, t.trials - t.unsendable),
    exactRightRate: ratio(t.exactRight, t.flaggedExact),
    intervalCoverage: ratio(t.intervalCovers, t.answered),
    wholePieceCoverage: ratio(t.wholePieceCovers, t.wholePieceAnswered),
    probabilityExactMean: ratio(t.probabilityExactSum, t.probabilityExactAnswered),
  };
}

export interface Judgement {
  pass: boolean;
  failures: string[];
  rates: Rates;
  /** The Wilson bounds each check used (null where the check does not apply). */
  exactRightUpper: number | null;
  coverageUpper: number | null;
  coverageLower: number | null;
}

/**
 * (a) Exact-right ≥ 99 % among flagged-exact trials: fails when the Clopper–Pearson upper bound
 *     (one-sided 0.135 %, as z = 3) is below.
 * (b) Resolved regimes (isResolved): interval coverage ≥ 93 %: fails when the upper bound is below.
 * (c) Resolved regimes with the spread known whose count does not move in steps (movesInSteps):
 *     coverage ≤ 99.5 % (an interval needlessly wide): fails when the Wilson lower bound is above.
 *     Held to resolved regimes for the same reason as (b): below 2d the GUM interval is not a 95 %
 *     statement in either direction. It only bites with more than ~1 800 answers (n/(n + z²) > 0.995
 *     when all are covered).
 * Errors are not judged here: callers assert them separately.
 */
export function judgeRegime(regime: Regime, t: Tally, z: number = ALLOWANCE_Z): Judgement {
  const rates = ratesOf(t);
  const failures: string[] = [];
  const pct = (x: number | null): string => (x == null ? '–' : `${(100 * x).toFixed(2)} %`);
  let exactRightUpper: number | null = null;
  if (t.flaggedExact > 0) {
    exactRightUpper =
      z === ALLOWANCE_Z ? clopperPearsonUpper(t.exactRight, t.flaggedExact, ALPHA_AT_Z3) : wilsonInterval(t.exactRight, t.flaggedExact, z).upper;
    if (exactRightUpper < LIMITS.exactRight) {
      failures.push(`exact-right ${t.exactRight}/${t.flaggedExact} = ${pct(rates.exactRightRate)} (upper ${pct(exactRightUpper)} < 99 %)`);
    }
  }
  let coverageUpper: number | null = null;
  let coverageLower: number | null = null;
  if (isResolved(regime) && t.answered > 0) {
    const bounds = wilsonInterval(t.intervalCovers, t.answered, z);
    coverageUpper = bounds.upper;
    if (bounds.upper < LIMITS.minCoverage) {
      failures.push(`coverage ${t.intervalCovers}/${t.answered} = ${pct(rates.intervalCoverage)} (upper ${pct(bounds.upper)} < 93 %)`);
    }
    if (regime.knowledge === 'known' && !movesInSteps(regime)) {
      coverageLower = bounds.lower;
      if (bounds.lower > LIMITS.maxCoverage) {
        failures.push(`coverage ${t.intervalCovers}/${t.answered} = ${pct(rates.intervalCoverage)} too wide (lower ${pct(bounds.lower)} > 99.5 %)`);
      }
    }
  }
  return { pass: failures.length === 0, failures, rates, exactRightUpper, coverageUpper, coverageLower };
}

/**
 * Near a limit: the z = 3 interval still straddles a limit the regime is judged on, so more trials
 * could change the verdict (the bench spends its extra trials there).
 */
export function nearLimit(regime: Regime, t: Tally, z: number = ALLOWANCE_Z): boolean {
  const straddles = (k: number, n: number, limit: number): boolean => {
    if (n === 0) return false;
    const b = wilsonInterval(k, n, z);
    return b.lower <= limit && limit <= b.upper;
  };
  if (straddles(t.exactRight, t.flaggedExact, LIMITS.exactRight)) return true;
  if (!isResolved(regime)) return false;
  if (straddles(t.intervalCovers, t.answered, LIMITS.minCoverage)) return true;
  return regime.knowledge === 'known' && straddles(t.intervalCovers, t.answered, LIMITS.maxCoverage);
}
