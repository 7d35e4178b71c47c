// Times the release service on one order of 500 kits × 50 lines, with stock for every part, and
// counts its SQL statements at 5, 50 and 200 lines: release is set-based, so the count must not grow.

import { performance } from 'node:perf_hooks';
import { Part, User } from '../../models';
import { getDb } from '../../server/db';
import type { SessionUser } from '../../server/auth/session';
import { createKit } from '../../server/services/kits/create-kit';
import { createOrder } from '../../server/services/orders/create-order';
import { releaseOrder } from '../../server/services/orders/release-order';
import { appendFigures, runStamp } from './figures';

const KITS = 500;
const LINES = 50;
const RUNS = 7;
const LINE_COUNTS = [5, LINES, 200];
const RESULTS = 'bench-results/release.json';

const db = getDb();
let statements: string[] = [];
// Sequelize reads its logging option at query time; every statement passes through here.
Object.assign((db as unknown as { options: object }).options, { logging: (sql: string) => statements.push(sql), benchmark: false });

async function kitWithLines(lines: number, by: SessionUser, tag: string): Promise<number> {
  const parts = await Part.bulkCreate(
    Array.from({ length: lines }, (_, i) => ({
      partNumber: `BENCH-${tag}-${i}`,
      description: 'bench part',
      apwG: null,
      apwSampleSize: null,
      pieceSpread: null,
      photoFile: null,
    })),
  );
  await db.query(`INSERT INTO part_stock (part_id, on_hand, reserved) VALUES ${parts.map((p) => `(${p.id}, 100000000, 0)`).join(',')}`);
  const { kit } = await createKit({
    input: {
      code: `BENCH-${tag}`,
      revision: 'A',
      description: `${lines}-line bench kit`,
      components: parts.map((p) => ({ partId: p.id, quantity: 3, toleranceBelow: 0, toleranceAbove: 0 })),
    },
    by,
  });
  return kit.id;
}

async function timedRelease(kitId: number, by: SessionUser): Promise<{ ms: number; queries: number; sql: string[] }> {
  const { order } = await createOrder({ input: { kitId, quantity: KITS, dueDate: null }, by });
  statements = [];
  const start = performance.now();
  await releaseOrder({ orderId: order.id, version: order.version, by });
  return { ms: performance.now() - start, queries: statements.length, sql: statements.map((s) => s.replace(/^Executing \([^)]*\): /, '').slice(0, 60)) };
}

async function main(): Promise<void> {
  const user = await User.create({ email: `bench-${Date.now()}@example.test`, name: 'Bench Planner', role: 'planner', passwordHash: null, active: true });
  const by: SessionUser = { id: user.id, name: user.name, email: user.email, role: 'planner' };
  const queriesByLines: Record<number, number> = {};
  let timings: number[] = [];
  let sql: string[] = [];
  for (const lines of LINE_COUNTS) {
    const kitId = await kitWithLines(lines, by, `${lines}L`);
    const runs = lines === LINES ? RUNS : 1;
    const results = [];
    for (let i = 0; i < runs; i++) results.push(await timedRelease(kitId, by));
    queriesByLines[lines] = results[0].queries;
    if (lines === LINES) {
      timings = results.map((r) => r.ms).sort((a, b) => a - b);
      sql = results[0].sql;
    }
  }
  const fixed = new Set(Object.values(queriesByLines)).size === 1;
  const figures = {
    ...runStamp('release'),
    order: { kits: KITS, lines: LINES, piecesPerLine: 3 * KITS },
    runs: RUNS,
    ms: { median: round(timings[Math.floor(timings.length / 2)]), min: round(timings[0]), max: round(timings[timings.length - 1]) },
    queriesByLines,
    fixedQueryCount: fixed,
    statements: sql,
  };
  appendFigures(RESULTS, figures);
  console.log(JSON.stringify({ ...figures, statements: undefined }, null, 2));
  await db.close();
  if (!fixed) {
    console.error(`release ran a different number of statements at ${LINE_COUNTS.join(' / ')} lines: ${JSON.stringify(queriesByLines)}`);
    process.exit(1);
  }
}

const round = (ms: number) => Math.round(ms * 10) / 10;

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
