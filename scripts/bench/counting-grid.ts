// The full counting grid (tests/reference/counting-simulator, 24 000 regimes) through the pure
// estimate function, on worker threads. Writes bench-results/counting-grid.json (per-regime tallies
// and rates, pooled rates, failing-regime counts, elapsed time) and prints a summary with the worst
// regimes. Monte Carlo validation of the count's interval as in JCGM 101:2008; see grid.ts.
//
//   tsx scripts/bench/counting-grid.ts [--trials 400] [--extra 2000] [--budget 240] [--workers 2] [--seed 1]
//
// Time: the run aims at --budget seconds in all. Phase 1 gives every regime the same trials: --trials,
// or, by default, as many (up to 400) as fit 60 % of the budget at the cost per call measured in a
// short pilot. Phase 2 gives --extra more trials to regimes that fail, then to those whose verdict
// is still open (a z = 3 Wilson interval straddling a limit), as long as the budget lasts.
import { mkdirSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import { performance } from 'node:perf_hooks';
import { Worker, isMainThread, parentPort } from 'node:worker_threads';
import { estimateCount } from '../../lib/weighing/estimate';
import {
  ALLOWANCE_Z,
  LIMITS,
  fullGrid,
  isResolved,
  judgeRegime,
  mergeTallies,
  nearLimit,
  ratesOf,
  regimeKey,
  regimeSeed,
  runRegime,
  type Tally,
} from '../../tests/reference/counting-simulator/grid';
import type { EstimateRequest, EstimateResponse, Regime } from '../../tests/reference/counting-simulator/simulator';

const RESULTS = 'bench-results/counting-grid.json';
const MAX_BASE_TRIALS = 400;
const MIN_BASE_TRIALS = 50;
const CHUNK = 40; // regimes a message: small enough to balance two workers, large enough to be cheap

const estimate = (request: EstimateRequest): EstimateResponse =>
  estimateCount(request as unknown as Parameters<typeof estimateCount>[0]) as unknown as EstimateResponse;

interface Job {
  index: number;
  regime: Regime;
  trials: number;
  seed: number;
}
interface Done {
  index: number;
  tally: Tally;
  ms: number;
}

function runJob(job: Job): Done {
  const t0 = performance.now();
  const tally = runRegime(job.regime, job.trials, job.seed, estimate);
  return { index: job.index, tally, ms: performance.now() - t0 };
}

// ---------------------------------------------------------------------------------------------
// Worker side: run the jobs it is sent, send back their tallies.

if (!isMainThread) {
  parentPort!.on('message', (jobs: Job[]) => parentPort!.postMessage(jobs.map(runJob)));
} else {
  main().catch((e: unknown) => {
    console.error(e);
    process.exit(1);
  });
}

// ---------------------------------------------------------------------------------------------
// Main side

function flag(name: string, fallback: number | null): number | null {
  const i = process.argv.indexOf(`--${name}`);
  if (i < 0) return fallback;
  const value = Number(process.argv[i + 1]);
  if (!Number.isFinite(value) || value <= 0) throw new Error(`--${name} needs a number above 0`);
  return value;
}

function startPool(size: number): Worker[] {
  // Workers load this TypeScript file through tsx's CommonJS hook, as the script itself is loaded.
  return Array.from({ length: size }, () => new Worker(`require('tsx/cjs'); require(${JSON.stringify(__filename)});`, { eval: true }));
}

/** Runs the jobs over the pool, a chunk per message, each worker fetching the next when done. */
function runOnPool(pool: Worker[], jobs: Job[]): Promise<Done[]> {
  const chunks: Job[][] = [];
  for (let i = 0; i < jobs.length; i += CHUNK) chunks.push(jobs.slice(i, i + CHUNK));
  const done: Done[] = [];
  let sent = 0;
  let received = 0;
  return new Promise((resolve, reject) => {
    if (chunks.length === 0) return resolve(done);
    for (const worker of pool) {
      worker.removeAllListeners('message');
      worker.removeAllListeners('error');
      worker.on('error', reject);
      worker.on('message', (results: Done[]) => {
        done.push(...results);
        received += 1;
        if (received === chunks.length) resolve(done);
        else if (sent < chunks.length) worker.postMessage(chunks[sent++]);
      });
      if (sent < chunks.length) worker.postMessage(chunks[sent++]);
    }
  });
}

/** Mean cost of one trial (ms), from a few trials of every 100th regime, on this thread. */
function pilotCost(grid: Regime[], seed: number): number {
  let ms = 0;
  let trials = 0;
  for (let i = 0; i < grid.length; i += 100) {
    const result = runJob({ index: i, regime: grid[i], trials: 20, seed: regimeSeed(seed + 1000, grid[i]) });
    ms += result.ms;
    trials += 20;
  }
  return ms / trials;
}

/** How close a regime is to flipping a verdict: the smallest |k − n·L| / √(n·L·(1 − L)) over its checks. */
function marginality(regime: Regime, t: Tally): number {
  const z = (k: number, n: number, limit: number): number => (n === 0 ? Infinity : Math.abs(k - n * limit) / Math.sqrt(n * limit * (1 - limit)));
  let m = z(t.exactRight, t.flaggedExact, LIMITS.exactRight);
  if (isResolved(regime)) {
    m = Math.min(m, z(t.intervalCovers, t.answered, LIMITS.minCoverage));
    if (regime.knowledge === 'known') m = Math.min(m, z(t.intervalCovers, t.answered, LIMITS.maxCoverage));
  }
  return m;
}

const round4 = (x: number | null): number | null => (x == null ? null : Math.round(x * 1e4) / 1e4);
const pct = (x: number | null): string => (x == null ? '–' : `${(100 * x).toFixed(2)} %`);

async function main(): Promise<void> {
  const started = performance.now();
  const seed = flag('seed', 1)!;
  const budgetS = flag('budget', 240)!;
  const extra = flag('extra', 2000)!;
  const workers = flag('workers', Math.max(1, Math.min(os.availableParallelism(), 2)))!;
  const grid = fullGrid();

  const costMs = pilotCost(grid, seed);
  const fitted = Math.floor((0.6 * budgetS * 1000 * workers) / (grid.length * costMs) / 10) * 10;
  const baseTrials = flag('trials', Math.max(MIN_BASE_TRIALS, Math.min(MAX_BASE_TRIALS, fitted)))!;
  console.log(`counting grid: ${grid.length} regimes, ${baseTrials} trials each, ${workers} workers (pilot: ${(costMs * 1000).toFixed(0)} µs a trial)`);

  const pool = startPool(workers);
  const phase1 = await runOnPool(
    pool,
    grid.map((regime, index) => ({ index, regime, trials: baseTrials, seed: regimeSeed(seed, regime) })),
  );
  const tallies: Tally[] = new Array(grid.length);
  const msPerTrial: number[] = new Array(grid.length);
  for (const d of phase1) {
    tallies[d.index] = d.tally;
    msPerTrial[d.index] = d.ms / Math.max(1, d.tally.trials);
  }
  const phase1S = (performance.now() - started) / 1000;

  // Phase 2: failing regimes first (at 50–400 trials a z = 3 Wilson bound still fails a good regime
  // now and then, and 24 000 regimes give chance many tries), then open verdicts, each group most
  // marginal first, while the estimated cost fits what is left.
  const failsNow = (index: number): boolean => !judgeRegime(grid[index], tallies[index]).pass;
  const open = grid.map((regime, index) => ({ index, regime })).filter(({ regime, index }) => failsNow(index) || nearLimit(regime, tallies[index]));
  const openRank = (index: number): number => (failsNow(index) ? 0 : 1);
  open.sort((a, b) => openRank(a.index) - openRank(b.index) || marginality(a.regime, tallies[a.index]) - marginality(b.regime, tallies[b.index]));
  let leftMs = (budgetS - phase1S) * 1000 * workers * 0.75; // a margin: the costliest regimes are the ones extended
  const extraJobs: Job[] = [];
  for (const { index, regime } of open) {
    const cost = extra * msPerTrial[index];
    if (cost > leftMs) continue;
    leftMs -= cost;
    extraJobs.push({ index, regime, trials: extra, seed: regimeSeed(seed + 1, regime) });
  }
  for (const d of await runOnPool(pool, extraJobs)) tallies[d.index] = mergeTallies(tallies[d.index], d.tally);
  await Promise.all(pool.map((w) => w.terminate()));
  const extended = new Set(extraJobs.map((j) => j.index));

  const rows = grid.map((regime, index) => {
    const t = tallies[index];
    const judged = judgeRegime(regime, t);
    const rates = ratesOf(t);
    return {
      key: regimeKey(regime),
      regime,
      resolved: isResolved(regime),
      extended: extended.has(index),
      tally: t,
      rates: {
        flaggedExact: round4(rates.flaggedExactRate),
        exactRight: round4(rates.exactRightRate),
        coverage: round4(rates.intervalCoverage),
        wholePieceCoverage: round4(rates.wholePieceCoverage),
        probabilityExactMean: round4(rates.probabilityExactMean),
      },
      bounds: { exactRightUpper: round4(judged.exactRightUpper), coverageUpper: round4(judged.coverageUpper), coverageLower: round4(judged.coverageLower) },
      pass: judged.pass,
      failures: judged.failures,
    };
  });

  const sum = (f: (t: Tally) => number, only: (r: (typeof rows)[number]) => boolean = () => true): number =>
    rows.filter(only).reduce((a, r) => a + f(r.tally), 0);
  const resolved = (r: (typeof rows)[number]): boolean => r.resolved;
  const overall = {
    trials: sum((t) => t.trials),
    unsendable: sum((t) => t.unsendable),
    errors: sum((t) => t.errors),
    flaggedExactRate: round4(
      sum((t) => t.flaggedExact) /
        Math.max(
          1,
          sum((t) => t.trials - t.unsendable),
        ),
    ),
    exactRightRate: round4(
      sum((t) => t.exactRight) /
        Math.max(
          1,
          sum((t) => t.flaggedExact),
        ),
    ),
    coverageResolved: round4(
      sum((t) => t.intervalCovers, resolved) /
        Math.max(
          1,
          sum((t) => t.answered, resolved),
        ),
    ),
    coverageAll: round4(
      sum((t) => t.intervalCovers) /
        Math.max(
          1,
          sum((t) => t.answered),
        ),
    ),
    wholePieceCoverage: round4(
      sum((t) => t.wholePieceCovers) /
        Math.max(
          1,
          sum((t) => t.wholePieceAnswered),
        ),
    ),
    probabilityExactMean: round4(
      sum((t) => t.probabilityExactSum) /
        Math.max(
          1,
          sum((t) => t.probabilityExactAnswered),
        ),
    ),
  };
  const failingBy = (pattern: RegExp): number => rows.filter((r) => r.failures.some((f) => pattern.test(f))).length;
  const failing = {
    regimes: rows.filter((r) => !r.pass).length,
    exactRight: failingBy(/^exact-right/),
    coverageLow: failingBy(/< 93 %/),
    coverageHigh: failingBy(/too wide/),
    withErrors: rows.filter((r) => r.tally.errors > 0).length,
  };
  // Worst = the rate most surely low: the smallest z = 3 Wilson upper bound (raw rate shown beside).
  const lowest = (candidates: typeof rows, bound: (r: (typeof rows)[number]) => number | null) =>
    candidates.reduce<(typeof rows)[number] | null>((w, r) => {
      const b = bound(r);
      return b != null && (w == null || b < bound(w)!) ? r : w;
    }, null);
  const worstExact = lowest(rows, (r) => r.bounds.exactRightUpper);
  const worstCoverage = lowest(rows.filter(resolved), (r) => r.bounds.coverageUpper);
  const widest = lowest(
    rows.filter((r) => r.bounds.coverageLower != null),
    (r) => -r.bounds.coverageLower!,
  );
  const withErrors = rows.filter((r) => r.tally.errors > 0).sort((a, b) => b.tally.errors - a.tally.errors);
  const elapsedS = (performance.now() - started) / 1000;

  mkdirSync('bench-results', { recursive: true });
  writeFileSync(
    RESULTS,
    JSON.stringify({
      generatedAt: new Date().toISOString(),
      seed,
      workers,
      budgetS,
      baseTrials,
      extraTrials: extra,
      pilotMicrosecondsPerTrial: Math.round(costMs * 1000),
      allowanceZ: ALLOWANCE_Z,
      limits: LIMITS,
      regimes: grid.length,
      openAfterPhase1: open.length,
      extended: extended.size,
      elapsedSeconds: Math.round(elapsedS * 10) / 10,
      phase1Seconds: Math.round(phase1S * 10) / 10,
      overall,
      failing,
      worst: { exactRight: worstExact?.key ?? null, coverage: worstCoverage?.key ?? null, widestKnownCoverage: widest?.key ?? null },
      perRegime: rows,
    }),
  );

  const describe = (r: (typeof rows)[number] | null, what: string): string =>
    r == null ? '–' : `${r.key}: ${what} (${r.tally.trials} trials${r.extended ? ', extended' : ''})`;
  console.log(
    `  elapsed ${elapsedS.toFixed(0)} s (phase 1 ${phase1S.toFixed(0)} s); ${overall.trials} trials; ${open.length} regimes failing or open after phase 1, ${extended.size} given ${extra} more`,
  );
  console.log(
    `  pooled: exact-right ${pct(overall.exactRightRate)} of ${pct(overall.flaggedExactRate)} flagged exact; coverage ${pct(overall.coverageResolved)} resolved, ${pct(overall.coverageAll)} all; whole-piece ${pct(overall.wholePieceCoverage)}; P(exact) mean ${pct(overall.probabilityExactMean)}`,
  );
  console.log(
    `  failing regimes: ${failing.regimes} of ${grid.length} (exact-right ${failing.exactRight}, coverage low ${failing.coverageLow}, too wide ${failing.coverageHigh}); ${failing.withErrors} with errors (${overall.errors} errors), ${overall.unsendable} trials unsendable`,
  );
  console.log(
    `  WORST exact-right: ${describe(worstExact, worstExact ? `${worstExact.tally.exactRight}/${worstExact.tally.flaggedExact} = ${pct(worstExact.rates.exactRight)}, upper ${pct(worstExact.bounds.exactRightUpper)}` : '')}`,
  );
  console.log(
    `  WORST coverage:    ${describe(worstCoverage, worstCoverage ? `${pct(worstCoverage.rates.coverage)}, upper ${pct(worstCoverage.bounds.coverageUpper)}` : '')}`,
  );
  console.log(`  widest (known c):  ${describe(widest, widest ? `${pct(widest.rates.coverage)}, lower ${pct(widest.bounds.coverageLower)}` : '')}`);
  if (withErrors.length > 0) console.log(`  most errors:       ${withErrors[0].key}: ${withErrors[0].tally.errors}, first: ${withErrors[0].tally.firstError}`);
  console.log(`  wrote ${RESULTS}`);
}
