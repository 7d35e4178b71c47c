// npm run bench: the hot paths against the framework floor. Each target in turn gets a short warm-up, then
// a few seconds measured, at 8 and at 32 connections (autocannon); every response must have its status:
//   floor        GET /api/floor of a minimal Next.js app on the same Next version (next-floor.ts, `next start`);
//   live         GET /api/v1/health/live, a route that touches no table;
//   nope         GET /api/v1/nope, the JSON 404 (no route, no database);
//   health       GET /api/v1/health, with its SELECT 1;
//   session      GET /api/v1/session, signed in: what every signed-in route does before its own work;
//   capture      POST /api/v1/counts, a fresh Idempotency-Key each request, as the bench page sends it;
//   estimate     POST /api/v1/counting/estimate, the server-checked preview;
//   orders, bins, counts, parts   the first page of each list, its table filled to 10,000 rows (list-rows.ts);
//   primaryKey   a bare MariaDB primary-key lookup behind a plain node:http server (primary-key-server.ts).
// Single runs on this machine vary by up to a third, so every target is measured ROUNDS times, the floor
// in every round; each round's ratio is to that round's floor and the median is reported, with its range.
// Each target is reported as a share of the floor's throughput and a multiple of its p95 against the goals
// of issue 16 (GOALS below). Last, a few targets again on two app processes (APP_PROCESSES=2) sharing the
// same cores. The figures are appended to bench-results/load.json.
import autocannon from 'autocannon';
import type { ChildProcess } from 'node:child_process';
import { randomUUID } from 'node:crypto';

import os from 'node:os';
import { Bin, BuildOrder, BuildOrderLine, Kit, Part, Scale, User } from '../../models';
import { hashPassword } from '../../server/auth/passwords';
import { getDb } from '../../server/db';
import { getEnv } from '../../server/env';
import { freePort, startApp } from '../next-start';
import { signIn } from './bench-sign-in';
import { startNextFloor } from './next-floor';
import { startPrimaryKeyServer } from './primary-key-floor';
import { appendFigures, runStamp } from './figures';
import { copyOrderLines, fillByCopying, LIST_ROWS } from './list-rows';

const CONNECTION_LEVELS = [8, 32] as const;
const ROUNDS = Number(process.env.TF_BENCH_ROUNDS ?? 3);
const WARMUP_S = 1;
const MEASURE_S = 5;
const RESULTS = 'bench-results/load.json';
// Nothing here sends mail: the SMTP port given beside these is one that nobody listens on.
const APP_ENV = { TF_JOBS: '0', SMTP_HOST: '127.0.0.1' };
// What the two-process figure measures: the bare pipeline, the signed-in floor, the capture and a list.
const TWO_PROCESS_TARGETS: TargetName[] = ['live', 'session', 'capture', 'parts'];

// The floor is the framework's own least: one Next.js route handler answering JSON, built and started as
// Next starts an app, on the same loopback and the same autocannon. A ratio to it says what the app adds
// to what Next costs anyway; on this 2-core machine autocannon, Next and MariaDB share the cores, so read
// the ratios, not the absolute figures. The database floor (primaryKey) is the least a route that reads
// one row could cost, served over HTTP from its own Node process.

type TargetName = 'floor' | 'live' | 'nope' | 'health' | 'session' | 'capture' | 'estimate' | 'orders' | 'bins' | 'counts' | 'parts' | 'primaryKey';

interface Target {
  request: string;
  url: string;
  spec: autocannon.Request;
  status: number;
  /** Signs in afresh before each run, so no run outlives the minute after which the cookie is rolled. */
  signedIn?: boolean;
  /** A new Idempotency-Key per request: the same key again would be answered as a replay. */
  freshKey?: boolean;
}

// Issue 16, at 32 connections: a share of the floor's throughput, and at most a multiple of its p95.
const GOALS: Partial<Record<TargetName, { share: number; p95Times?: number }>> = {
  live: { share: 0.8 },
  nope: { share: 0.8 },
  session: { share: 0.6 },
  capture: { share: 0.25, p95Times: 4 },
  orders: { share: 0.3 },
  bins: { share: 0.3 },
  counts: { share: 0.3 },
  parts: { share: 0.3 },
};

interface Measured {
  request: string;
  connections: number;
  responses: number;
  requestsPerSecond: number;
  latencyMs: { p50: number; p95: number; p99: number };
  unexpected: Record<string, number>;
  errors: number;
  timeouts: number;
}

// 25 pieces of about 0.6 g as the sample, left on the pan, then about 75 more added (tests/api/counts.test.ts).
const captureBody = (partId: number, scaleId: number) => ({
  purpose: 'part',
  partId,
  scaleId,
  unit: 'g',
  gross: 112.3,
  tare: 52.3,
  sample: { quantity: 25, netWeight: 15 },
  sampleOnPan: true,
  stable: true,
});
// The same weighing as a preview, on the bench scale's profile.
const estimateBody = {
  unit: 'g',
  scale: { division: 0.1, repeatability: 0.05, max: 6000, min: 20 },
  sample: { quantity: 25, netWeight: 15 },
  netWeight: 60,
  sampleOnPan: true,
};

async function benchWorld(password: string): Promise<{ email: string; partId: number; scaleId: number; binId: number; orderId: number }> {
  const tag = randomUUID().slice(0, 8);
  const user = await User.create({
    email: `load-${tag}@example.test`,
    name: 'Load Bench Operator',
    role: 'operator',
    passwordHash: await hashPassword(password),
    active: true,
  });
  const part = await Part.create({
    partNumber: `LOAD-${tag}`.toUpperCase(),
    description: 'load bench part',
    countingMethod: 'scale',
    apwG: null,
    apwSampleSize: null,
    pieceSpread: null,
    photoFile: null,
  });
  // A class III bench scale, 6 kg × 0.1 g, e = 1 g, as the API tests make.
  const scale = await Scale.create({
    name: `load-${tag}`,
    location: 'load bench',
    capacityG: '6000',
    minLoadG: '20',
    divisionG: '0.1',
    verificationIntervalG: '1',
    accuracyClass: 'III',
    repeatabilityG: '0.05',
    connection: { kind: 'simulator', settleMs: 250, driftPerMinute: 0, rateHz: 20 },
    status: 'in_service',
    statusReason: null,
    calibrationDueAt: null,
  });
  // The rows the list tables are filled from: a bin, and a draft order of a kit with one line.
  const bin = await Bin.create({ code: 'LB-01-1-01', partId: part.id, containerId: null, bookQuantity: 400, abcClass: 'B', lastCountedAt: null });
  const kit = await Kit.create({ code: `LOAD-KIT-${tag}`.toUpperCase(), revision: 'A', description: 'load bench kit' });
  const order = await BuildOrder.create({
    number: `LOAD-${tag}`.toUpperCase(),
    kitId: kit.id,
    quantity: 5,
    dueDate: null,
    createdBy: user.id,
    releasedAt: null,
    completedAt: null,
    cancelledAt: null,
    overrideReason: null,
  });
  await BuildOrderLine.create({ orderId: order.id, partId: part.id, quantityPerKit: 4, required: 20, toleranceBelow: 0, toleranceAbove: 0 });
  return { email: user.email, partId: part.id, scaleId: scale.id, binId: bin.id, orderId: order.id };
}

// Every list table filled to LIST_ROWS rows; the count log's template is one capture made through the API.
async function fillLists(url: string, world: Awaited<ReturnType<typeof benchWorld>>, password: string): Promise<void> {
  const db = getDb();
  const cookie = await signIn(url, world.email, password);
  const res = await fetch(`${url}/api/v1/counts`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: url, cookie, 'idempotency-key': randomUUID() },
    body: JSON.stringify(captureBody(world.partId, world.scaleId)),
  });
  if (res.status !== 201) throw new Error(`the count log's template capture failed: ${res.status} ${await res.text()}`);
  const { count } = (await res.json()) as { count: { id: number } };
  await fillByCopying(db, 'parts', world.partId);
  await fillByCopying(db, 'bins', world.binId);
  await fillByCopying(db, 'count_events', count.id);
  const firstOrder = await fillByCopying(db, 'build_orders', world.orderId);
  if (firstOrder) await copyOrderLines(db, world.orderId, firstOrder);
}

function fire(target: Target, connections: number, seconds: number): Promise<Measured> {
  return new Promise((resolve, reject) => {
    const latencies: number[] = [];
    const unexpected: Record<string, number> = {};
    const instance = autocannon({ url: target.url, connections, duration: seconds, requests: [target.spec] }, (err, result) => {
      if (err) return reject(err);
      // Autocannon's own percentiles stop at p90 and p97.5; these are nearest-rank over every expected response.
      latencies.sort((a, b) => a - b);
      const at = (p: number) => round(latencies[Math.max(0, Math.ceil((p / 100) * latencies.length) - 1)] ?? NaN, 2);
      resolve({
        request: target.request,
        connections,
        responses: latencies.length,
        requestsPerSecond: round(latencies.length / result.duration),
        latencyMs: { p50: at(50), p95: at(95), p99: at(99) },
        unexpected,
        errors: result.errors,
        timeouts: result.timeouts,
      });
    });
    instance.on('response', (_client, status, _bytes, ms) => {
      if (status === target.status) latencies.push(ms);
      else unexpected[status] = (unexpected[status] ?? 0) + 1;
    });
  });
}

const failures = (m: Measured) => Object.values(m.unexpected).reduce((a, b) => a + b, 0) + m.errors + m.timeouts;

interface Summary {
  request: string;
  requestsPerSecond: number;
  latencyMs: { p50: number; p95: number; p99: number };
  /** Each round against that round's floor; the median, and the lowest and highest of the rounds. */
  vsFloor?: { share: number; shareRange: [number, number]; p95Times: number; p95TimesRange: [number, number] };
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

// One target over the rounds: its median figures, and its share of the floor's throughput (1 = as fast as
// the floor) and multiple of the floor's p95, each round against the floor measured in that round.
function summarize(name: TargetName, rounds: Array<Record<TargetName, Measured>>): Summary {
  const of = (pick: (m: Measured) => number) => round(median(rounds.map((r) => pick(r[name]))), 2);
  const summary: Summary = {
    request: rounds[0][name].request,
    requestsPerSecond: round(median(rounds.map((r) => r[name].requestsPerSecond))),
    latencyMs: { p50: of((m) => m.latencyMs.p50), p95: of((m) => m.latencyMs.p95), p99: of((m) => m.latencyMs.p99) },
  };
  if (name === 'floor') return summary;
  const shares = rounds.map((r) => round(r[name].requestsPerSecond / r.floor.requestsPerSecond, 2));
  const p95s = rounds.map((r) => round(r[name].latencyMs.p95 / r.floor.latencyMs.p95, 2));
  return {
    ...summary,
    vsFloor: {
      share: round(median(shares), 2),
      shareRange: [Math.min(...shares), Math.max(...shares)],
      p95Times: round(median(p95s), 2),
      p95TimesRange: [Math.min(...p95s), Math.max(...p95s)],
    },
  };
}

async function stop(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null) return;
  const exited = new Promise((r) => child.once('exit', r));
  child.kill('SIGTERM');
  const timer = setTimeout(() => child.kill('SIGKILL'), 5_000);
  await exited;
  clearTimeout(timer);
}

async function main(): Promise<void> {
  const db = getDb();
  const password = randomUUID();
  const world = await benchWorld(password);
  const app = await startApp({ ...APP_ENV, SMTP_PORT: String(await freePort()) }, 'bench-results');
  const helpers: ChildProcess[] = [];
  try {
    const nextFloor = await startNextFloor();
    helpers.push(nextFloor.child);
    const dbFloor = await startPrimaryKeyServer(world.partId);
    helpers.push(dbFloor.child);
    const targets = benchTargets(app.url, nextFloor.url, dbFloor.url, world);
    await fillLists(app.url, world, password);
    const loadBefore = os.loadavg();
    // TF_BENCH_TARGETS=orders,bins measures only those (and the floor), for a quick look while working.
    const only = process.env.TF_BENCH_TARGETS?.split(',').map((t) => t.trim());
    const names = (Object.keys(targets) as TargetName[]).filter((n) => !only || n === 'floor' || only.includes(n));
    const levels: Array<{ connections: number; rounds: Array<Record<TargetName, Measured>> }> = [];
    for (const connections of CONNECTION_LEVELS) levels.push({ connections, rounds: await measureRounds(targets, names, connections, world.email, password) });
    await stop(app.child);
    // The same targets on two app processes (APP_PROCESSES=2) sharing these two cores, at 32 connections.
    const two = await startApp({ ...APP_ENV, SMTP_PORT: String(await freePort()), APP_PROCESSES: '2' }, 'bench-results');
    helpers.push(two.child);
    const twoNames = names.filter((n) => n === 'floor' || TWO_PROCESS_TARGETS.includes(n));
    const twoRounds = await measureRounds(benchTargets(two.url, nextFloor.url, dbFloor.url, world), twoNames, 32, world.email, password);
    const twoProcesses = {
      processes: 2,
      connections: 32,
      targets: Object.fromEntries(twoNames.map((n) => [n, summarize(n, twoRounds)])) as Record<TargetName, Summary>,
    };
    const summary = levels.map(({ connections, rounds }) => ({
      connections,
      targets: Object.fromEntries(names.map((n) => [n, summarize(n, rounds)])) as Record<TargetName, Summary>,
    }));
    const at32 = summary.find((l) => l.connections === 32)!.targets;
    const goals = Object.fromEntries(
      (Object.entries(GOALS) as Array<[TargetName, { share: number; p95Times?: number }]>)
        .filter(([name]) => names.includes(name))
        .map(([name, goal]) => {
          const got = at32[name].vsFloor!;
          const met = got.share >= goal.share && (goal.p95Times === undefined || got.p95Times <= goal.p95Times);
          return [name, { goal, got: { share: got.share, p95Times: got.p95Times }, met }];
        }),
    );
    const figures = {
      ...runStamp('load'),
      loadAverage: { before: loadBefore.map((l) => round(l, 2)), after: os.loadavg().map((l) => round(l, 2)) },
      rounds: ROUNDS,
      warmupSeconds: WARMUP_S,
      measuredSeconds: MEASURE_S,
      dbPoolMax: getEnv().DB_POOL_MAX,
      listRows: LIST_ROWS,
      summary,
      goals,
      twoProcesses,
      levels,
      twoProcessRounds: twoRounds,
    };
    appendFigures(RESULTS, figures);

    console.log(
      `load: medians of ${ROUNDS} rounds, ${MEASURE_S} s per target after ${WARMUP_S} s warm-up; ${figures.cores} cores, load average ${figures.loadAverage.before.join(' ')}`,
    );
    for (const { connections, targets: m } of summary) {
      console.log(
        `  ${connections} connections: ${'target'.padEnd(58)} ${'req/s'.padStart(7)} ${'p50'.padStart(7)} ${'p95'.padStart(7)} ${'p99'.padStart(7)} ms  ${'× floor (range)'.padStart(18)} ${'p95 ×'.padStart(7)}`,
      );
      for (const r of Object.values(m)) {
        const vs = r.vsFloor ? `${r.vsFloor.share} (${r.vsFloor.shareRange.join('–')})` : '1';
        console.log(
          `  ${''.padEnd(16)}${r.request.padEnd(58)} ${String(r.requestsPerSecond).padStart(7)} ${[r.latencyMs.p50, r.latencyMs.p95, r.latencyMs.p99].map((v) => String(v).padStart(7)).join(' ')}     ${vs.padStart(18)} ${String(r.vsFloor?.p95Times ?? 1).padStart(7)}`,
        );
      }
    }
    console.log(`  two app processes (APP_PROCESSES=2) on the same ${figures.cores} cores, 32 connections:`);
    for (const [name, r] of Object.entries(twoProcesses.targets) as Array<[TargetName, Summary]>) {
      const one = at32[name];
      console.log(
        `  ${''.padEnd(16)}${r.request.padEnd(58)} ${String(r.requestsPerSecond).padStart(7)} ${[r.latencyMs.p50, r.latencyMs.p95, r.latencyMs.p99].map((v) => String(v).padStart(7)).join(' ')}     ${(r.vsFloor ? `${r.vsFloor.share} (one: ${one.vsFloor?.share})` : '1').padStart(18)}`,
      );
    }
    console.log("  goals at 32 connections (median share of the floor's req/s, p95 × the floor's):");
    for (const [name, g] of Object.entries(goals)) {
      console.log(
        `    ${name.padEnd(10)} share ${g.got.share} (goal ≥ ${g.goal.share})${g.goal.p95Times ? `, p95 × ${g.got.p95Times} (goal ≤ ${g.goal.p95Times})` : ''}: ${g.met ? 'met' : 'SHORT'}`,
      );
    }
    console.log(`  figures appended to ${RESULTS}`);

    const failed = [...levels.flatMap((l) => l.rounds), ...twoRounds].flatMap((r) => Object.values(r)).filter(failures);
    if (failed.length) {
      for (const m of failed)
        console.error(
          `${m.request} at ${m.connections}: not every response had its status: ${JSON.stringify({ unexpected: m.unexpected, errors: m.errors, timeouts: m.timeouts })}`,
        );
      process.exitCode = 1;
    }
  } finally {
    for (const child of helpers) await stop(child);
    await stop(app.child);
    await db.close();
  }
}

// What is measured, on the app at `appUrl`; the floors at their own addresses.
function benchTargets(appUrl: string, floorUrl: string, dbFloorUrl: string, world: { partId: number; scaleId: number }): Record<TargetName, Target> {
  const json = { 'content-type': 'application/json' };
  return {
    floor: { request: 'bare Next.js route handler (same version, next start)', url: floorUrl, spec: { method: 'GET', path: '/api/floor' }, status: 200 },
    live: { request: 'GET /api/v1/health/live', url: appUrl, spec: { method: 'GET', path: '/api/v1/health/live' }, status: 200 },
    nope: { request: 'GET /api/v1/nope (JSON 404)', url: appUrl, spec: { method: 'GET', path: '/api/v1/nope' }, status: 404 },
    health: { request: 'GET /api/v1/health (SELECT 1)', url: appUrl, spec: { method: 'GET', path: '/api/v1/health' }, status: 200 },
    session: { request: 'GET /api/v1/session (signed in)', url: appUrl, spec: { method: 'GET', path: '/api/v1/session' }, status: 200, signedIn: true },
    capture: {
      request: 'POST /api/v1/counts (a capture)',
      url: appUrl,
      // A browser sends its own origin on a write; rejectCrossSite accepts it as same-origin.
      spec: { method: 'POST', path: '/api/v1/counts', headers: { ...json, origin: appUrl }, body: JSON.stringify(captureBody(world.partId, world.scaleId)) },
      status: 201,
      signedIn: true,
      freshKey: true,
    },
    estimate: {
      request: 'POST /api/v1/counting/estimate',
      url: appUrl,
      spec: { method: 'POST', path: '/api/v1/counting/estimate', headers: { ...json, origin: appUrl }, body: JSON.stringify(estimateBody) },
      status: 200,
      signedIn: true,
    },
    orders: {
      request: `GET /api/v1/orders (first 100 of ${LIST_ROWS})`,
      url: appUrl,
      spec: { method: 'GET', path: '/api/v1/orders' },
      status: 200,
      signedIn: true,
    },
    bins: { request: `GET /api/v1/bins (first 100 of ${LIST_ROWS})`, url: appUrl, spec: { method: 'GET', path: '/api/v1/bins' }, status: 200, signedIn: true },
    counts: {
      request: `GET /api/v1/counts (first 100 of ${LIST_ROWS}+)`,
      url: appUrl,
      spec: { method: 'GET', path: '/api/v1/counts' },
      status: 200,
      signedIn: true,
    },
    parts: {
      request: `GET /api/v1/parts (first 100 of ${LIST_ROWS})`,
      url: appUrl,
      spec: { method: 'GET', path: '/api/v1/parts' },
      status: 200,
      signedIn: true,
    },
    primaryKey: { request: 'SELECT id FROM parts WHERE id = ? (mariadb behind node:http)', url: dbFloorUrl, spec: { method: 'GET', path: '/' }, status: 200 },
  };
}

// Every target ROUNDS times in turn, the floor among them, so each round's ratios share their minute.
async function measureRounds(
  targets: Record<TargetName, Target>,
  names: TargetName[],
  connections: number,
  email: string,
  password: string,
): Promise<Array<Record<TargetName, Measured>>> {
  const rounds: Array<Record<TargetName, Measured>> = [];
  for (let round = 0; round < ROUNDS; round += 1) {
    const measured = {} as Record<TargetName, Measured>;
    for (const name of names) {
      const run = await withCookie(targets[name], email, password);
      // The warm-up loads the route's code and fills the pools; a target that fails it is broken, not slow.
      const warm = await fire(run, connections, WARMUP_S);
      if (failures(warm))
        throw new Error(
          `${run.request} failed during warm-up: ${JSON.stringify({ unexpected: warm.unexpected, errors: warm.errors, timeouts: warm.timeouts })}`,
        );
      measured[name] = await fire(run, connections, MEASURE_S);
    }
    rounds.push(measured);
  }
  return rounds;
}

// A signed-in target gets a cookie of its own run.
async function withCookie(target: Target, email: string, password: string): Promise<Target> {
  if (!target.signedIn) return target;
  const cookie = await signIn(target.url, email, password);
  const spec: autocannon.Request = { ...target.spec, headers: { ...target.spec.headers, cookie } };
  if (target.freshKey) spec.setupRequest = (req) => ({ ...req, headers: { ...req.headers, 'idempotency-key': randomUUID() } });
  return { ...target, spec };
}

function round(n: number, digits = 1): number {
  return Math.round(n * 10 ** digits) / 10 ** digits;
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
