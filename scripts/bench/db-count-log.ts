// Times the count log on 200 000 captures (40 parts, 4 scales, 3 people, ~60 days): its first page
// unfiltered, by part, not-exact only, one week, a deep page, and the CSV of one part. The rows are
// written in bulk by SQL (the capture path has its own figures in load.json); the page and the CSV
// run the same service the app does.

import { performance } from 'node:perf_hooks';
import { Part, Scale, User } from '../../models';
import { getDb } from '../../server/db';
import type { CountLogQuery } from '../../lib/contracts/counts';
import { countLog, countLogTable } from '../../server/services/counting/count-log';
import { appendFigures, runStamp } from './figures';

const EVENTS = 200_000;
const PARTS = 40;
const DAYS = 60;
const RUNS = 5;
const RESULTS = 'bench-results/count-log.json';
const round = (x: number) => Math.round(x * 10) / 10;

const db = getDb();

async function world(): Promise<{ partNumber: string; from: string; to: string }> {
  const tag = Date.now().toString(36).toUpperCase();
  const users = await User.bulkCreate(
    Array.from({ length: 3 }, (_, i) => ({
      email: `log-bench-${tag}-${i}@example.test`,
      name: `Bench Operator ${i}`,
      role: 'operator' as const,
      passwordHash: null,
      active: true,
    })),
  );
  const scales = await Scale.bulkCreate(
    Array.from({ length: 4 }, (_, i) => ({
      name: `LOG-BENCH-${tag}-${i}`,
      location: 'bench',
      capacityG: '6000',
      minLoadG: '2',
      divisionG: '0.1',
      verificationIntervalG: '1',
      accuracyClass: 'III' as const,
      repeatabilityG: '0.05',
      connection: { kind: 'simulator', settleMs: 250, driftPerMinute: 0, rateHz: 20 },
    })),
  );
  const parts = await Part.bulkCreate(
    Array.from({ length: PARTS }, (_, i) => ({
      partNumber: `LOG-${tag}-${i}`,
      description: 'bench part',
      apwG: null,
      apwSampleSize: null,
      pieceSpread: null,
      photoFile: null,
    })),
  );
  const pick = (ids: number[], expr: string) => `ELT(1 + ${expr} % ${ids.length}, ${ids.join(',')})`;
  // seq_1_to_N is MariaDB's Sequence engine: one row per number, no table to fill first.
  await db.query(
    `INSERT INTO count_events (idempotency_key, request_hash, purpose, part_id, scale_id, container_id, gross_g, tare_g, net_g, sample_quantity, sample_net_g, sample_on_pan,
       apw_g, piece_spread, count_raw, count, standard_uncertainty, expanded_uncertainty, exact, target_quantity, warnings, operator_id, created_at, updated_at)
     SELECT CONCAT('log-bench-${tag}-', seq), REPEAT('0', 64), ELT(1 + seq % 4, 'part', 'bin', 'kit_line', 'audit'),
            ${pick(
              parts.map((p) => p.id),
              'seq',
            )}, ${pick(
              scales.map((s) => s.id),
              '(seq DIV 7)',
            )}, NULL,
            50 + seq % 500, 0, 50 + seq % 500, 20, 10, 1, 0.5, 0.01, (50 + seq % 500) / 0.5, (50 + seq % 500) * 2, 0.2, 0.4 + (seq % 5) * 0.1, (seq % 5) < 1, NULL,
            IF(seq % 5 < 1, JSON_ARRAY(), JSON_ARRAY(JSON_OBJECT('code', 'count_not_exact', 'message', 'not exact'))),
            ${pick(
              users.map((u) => u.id),
              '(seq DIV 3)',
            )},
            NOW(3) - INTERVAL (seq * ${DAYS * 86_400} DIV ${EVENTS}) SECOND, NOW(3)
       FROM seq_1_to_${EVENTS}`,
  );
  const day = (offset: number) => new Date(Date.now() - offset * 86_400_000).toISOString().slice(0, 10);
  return { partNumber: parts[7].partNumber, from: day(14), to: day(7) };
}

async function timed(run: () => Promise<unknown>): Promise<{ median: number; min: number; max: number }> {
  const ms: number[] = [];
  await run(); // warm the caches the way a second visitor finds them
  for (let i = 0; i < RUNS; i++) {
    const start = performance.now();
    await run();
    ms.push(performance.now() - start);
  }
  ms.sort((a, b) => a - b);
  return { median: round(ms[Math.floor(ms.length / 2)]), min: round(ms[0]), max: round(ms[ms.length - 1]) };
}

async function main(): Promise<void> {
  const { partNumber, from, to } = await world();
  const page = (q: CountLogQuery) => () => countLog(q);
  const figures = {
    ...runStamp('count-log'),
    events: EVENTS,
    runs: RUNS,
    ms: {
      firstPage: await timed(page({})),
      byPart: await timed(page({ partNumber })),
      notExact: await timed(page({ notExact: '1' })),
      oneWeek: await timed(page({ from, to })),
      page500: await timed(page({ page: 500 })),
      csvOnePart: await timed(() => countLogTable({ partNumber })),
    },
    csvOnePartRows: (await countLogTable({ partNumber })).rows.length,
  };
  appendFigures(RESULTS, figures);
  console.log(JSON.stringify(figures, null, 2));
  await db.close();
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
