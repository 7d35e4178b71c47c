/**
 * The estimate contract against an independent Monte Carlo model of counting by weight
 * (tests/reference/counting-simulator; Monte Carlo propagation as in JCGM 101:2008, the interval
 * as in JCGM 100:2008 "GUM" 6.2–6.3). The quick grid (~150 regimes, stratified, hard cases kept)
 * runs through the pure function with one fixed seed; every regime must pass judgeRegime:
 * exact counts right ≥ 99 %, ±U coverage ≥ 93 % where a piece is resolved (μ ≥ 2d), and not above
 * 99.5 % where the spread is known — each with a z = 3 Wilson allowance for chance. No call may
 * throw. The full grid is scripts/bench/counting-grid.ts.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { estimateCount } from '../../lib/weighing/estimate';
import { QUICK_TRIALS, judgeRegime, quickGrid, ratesOf, regimeKey, regimeSeed, runRegime, type Tally } from './counting-simulator/grid';
import type { EstimateRequest, EstimateResponse, Regime } from './counting-simulator/simulator';

const SEED = 20_080_901;

/** The pure function as the adapter: the request is the contract's JSON as is. */
const estimate = (request: EstimateRequest): EstimateResponse =>
  estimateCount(request as unknown as Parameters<typeof estimateCount>[0]) as unknown as EstimateResponse;

const pct = (x: number | null): string => (x == null ? '–' : `${(100 * x).toFixed(1)} %`);

describe('counting by weight against an independent simulation (quick grid)', () => {
  const results: { regime: Regime; tally: Tally }[] = [];

  // About a minute; one regime's draws depend only on SEED and its name.
  beforeAll(() => {
    for (const regime of quickGrid()) {
      results.push({ regime, tally: runRegime(regime, QUICK_TRIALS, regimeSeed(SEED, regime), estimate) });
    }
  }, 240_000);

  it('answers every request an operator could send', () => {
    const failing = results
      .filter((r) => r.tally.errors > 0)
      .map((r) => `${regimeKey(r.regime)}: ${r.tally.errors}/${r.tally.trials - r.tally.unsendable} errors, first: ${r.tally.firstError}`);
    expect(failing, `${failing.length} regimes with errors:\n${failing.join('\n')}`).toEqual([]);
  });

  it('passes the judgement in every regime', () => {
    const failing = results.flatMap(({ regime, tally }) => {
      const judged = judgeRegime(regime, tally);
      if (judged.pass) return [];
      const r = ratesOf(tally);
      return [
        `${regimeKey(regime)}: ${judged.failures.join('; ')} [flagged exact ${pct(r.flaggedExactRate)}, coverage ${pct(r.intervalCoverage)}, whole-piece ${pct(r.wholePieceCoverage)}, P(exact) mean ${pct(r.probabilityExactMean)}]`,
      ];
    });
    expect(failing, `${failing.length} of ${results.length} regimes fail:\n${failing.join('\n')}`).toEqual([]);
  });
});
