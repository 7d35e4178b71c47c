// npm run bench: the hot paths against the framework floor. Each target in turn gets a short warm-up, then
// 10 s measured, at 8 and at 32 connections (autocannon), and every response must have the target's status:
//   floor        GET /api/floor of a minimal Next.js app on the same Next version (next-floor.ts, `next start`);
//   live         GET /api/v1/health/live, a route that touches no table;
//   nope         GET /api/v1/nope, the JSON 404 (no route, no database);
//   health       GET /api/v1/health, with its SELECT 1;
//   session      GET /api/v1/session, signed in: what every signed-in route does before its own work;
//   capture      POST /api/v1/counts, a fresh Idempotency-Key each request, as the bench page sends it;
//   estimate     POST /api/v1/counting/estimate, the server-checked preview;
//   primaryKey   a bare MariaDB primary-key lookup behind a plain node:http server (primary-key-server.ts).
// Each target is reported as a share of the floor's throughput and a multiple of its p95, measured in the
// same run, against the goals of issue 16 (GOALS below); the figures are appended to bench-results/load.json.
import autocannon from 'autocannon';
import type { ChildProcess } from 'node:child_process';
import { randomUUID } from 'node:crypto';

import os from 'node:os';
import { Part, Scale, User } from '../../models';
import { hashPassword } from '../../server/auth/passwords';
import { getDb } from '../../server/db';
import { getEnv } from '../../server/env';
import { freePort, startApp } from '../next-start';
import { signIn } from './bench-sign-in';
import { startNextFloor } from './next-floor';
import { startPrimaryKeyServer } from './primary-key-floor';
import { appendFigures, runStamp } from './figures';

const CONNECTION_LEVELS = [8, 32] as const;
const WARMUP_S = 2;
const MEASURE_S = 10;
const RESULTS = 'bench-results/load.json';

// The floor is the framework's own least: one Next.js route handler answering JSON, built and started as
// Next starts an app, on the same loopback and the same autocannon. A ratio to it says what the app adds
// to what Next costs anyway; on this 2-core machine autocannon, Next and MariaDB share the cores, so read
// the ratios, not the absolute figures. The database floor (primaryKey) is the least a route that reads
// one row could cost, served over HTTP from its own Node process.

type TargetName = 'floor' | 'live' | 'nope' | 'health' | 'session' | 'capture' | 'estimate' | 'primaryKey';

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
const captureBody = (partId: number, scaleId: number) => ({ purpose: 'part', partId, scaleId, unit: 'g', gross: 112.3, tare: 52.3, sample: { quantity: 25, netWeight: 15 }, sampleOnPan: true, stable: true });
// The same weighing as a preview, on the bench scale's profile.
const estimateBody = { unit: 'g', scale: { division: 0.1, repeatability: 0.05, max: 6000, min: 20 }, sample: { quantity: 25, netWeight: 15 }, netWeight: 60, sampleOnPan: true };

async function benchWorld(password: string): Promise<{ email: string; partId: number; scaleId: number }> {
  const tag = randomUUID().slice(0, 8);
  const user = await User.create({ email: `load-${tag}@example.test`, name: 'Load Bench Operator', role: 'operator', passwordHash: await hashPassword(password), active: true });
  const part = await Part.create({ partNumber: `LOAD-${tag}`.toUpperCase(), description: 'load bench part', countingMethod: 'scale', apwG: null, apwSampleSize: null, pieceSpread: null, photoFile: null });
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
  return { email: user.email, partId: part.id, scaleId: scale.id };
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

// A share of the floor's throughput (1 = as fast as the floor), and multiples of its latencies.
function againstFloor(route: Measured, floor: Measured) {
  return {
    share: round(route.requestsPerSecond / floor.requestsPerSecond, 2),
    p50Times: round(route.latencyMs.p50 / floor.latencyMs.p50, 2),
    p95Times: round(route.latencyMs.p95 / floor.latencyMs.p95, 2),
    p99Times: round(route.latencyMs.p99 / floor.latencyMs.p99, 2),
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
  // Nothing here sends mail; the SMTP port is one that nobody listens on, so a stray send fails locally.
  const app = await startApp({ TF_JOBS: '0', SMTP_HOST: '127.0.0.1', SMTP_PORT: String(await freePort()) }, 'bench-results');
  const helpers: ChildProcess[] = [];
  try {
    const nextFloor = await startNextFloor();
    helpers.push(nextFloor.child);
    const dbFloor = await startPrimaryKeyServer(world.partId);
    helpers.push(dbFloor.child);
    const json = { 'content-type': 'application/json' };
    const targets: Record<TargetName, Target> = {
      floor: { request: 'bare Next.js route handler (same version, next start)', url: nextFloor.url, spec: { method: 'GET', path: '/api/floor' }, status: 200 },
      live: { request: 'GET /api/v1/health/live', url: app.url, spec: { method: 'GET', path: '/api/v1/health/live' }, status: 200 },
      nope: { request: 'GET /api/v1/nope (JSON 404)', url: app.url, spec: { method: 'GET', path: '/api/v1/nope' }, status: 404 },
      health: { request: 'GET /api/v1/health (SELECT 1)', url: app.url, spec: { method: 'GET', path: '/api/v1/health' }, status: 200 },
      session: { request: 'GET /api/v1/session (signed in)', url: app.url, spec: { method: 'GET', path: '/api/v1/session' }, status: 200, signedIn: true },
      capture: {
        request: 'POST /api/v1/counts (a capture)',
        url: app.url,
        // A browser sends its own origin on a write; rejectCrossSite accepts it as same-origin.
        spec: { method: 'POST', path: '/api/v1/counts', headers: { ...json, origin: app.url }, body: JSON.stringify(captureBody(world.partId, world.scaleId)) },
        status: 201,
        signedIn: true,
        freshKey: true,
      },
      estimate: { request: 'POST /api/v1/counting/estimate', url: app.url, spec: { method: 'POST', path: '/api/v1/counting/estimate', headers: { ...json, origin: app.url }, body: JSON.stringify(estimateBody) }, status: 200, signedIn: true },
      primaryKey: { request: 'SELECT id FROM parts WHERE id = ? (mariadb behind node:http)', url: dbFloor.url, spec: { method: 'GET', path: '/' }, status: 200 },
    };
    const loadBefore = os.loadavg();
    const levels: Array<{ connections: number; targets: Record<TargetName, Measured> }> = [];
    for (const connections of CONNECTION_LEVELS) {
      const measured = {} as Record<TargetName, Measured>;
      for (const [name, target] of Object.entries(targets) as Array<[TargetName, Target]>) {
        const run = await withCookie(target, world.email, password);
        // The warm-up loads the route's code and fills the pools; a target that fails it is broken, not slow.
        const warm = await fire(run, connections, WARMUP_S);
        if (failures(warm)) throw new Error(`${target.request} failed during warm-up: ${JSON.stringify({ unexpected: warm.unexpected, errors: warm.errors, timeouts: warm.timeouts })}`);
        measured[name] = await fire(run, connections, MEASURE_S);
      }
      levels.push({ connections, targets: measured });
    }
    const ratios = levels.map(({ connections, targets: m }) => ({
      connections,
      ...Object.fromEntries((Object.keys(m) as TargetName[]).filter((n) => n !== 'floor').map((n) => [n, againstFloor(m[n], m.floor)])),
    })) as Array<{ connections: number } & Record<Exclude<TargetName, 'floor'>, ReturnType<typeof againstFloor>>>;
    const at32 = ratios.find((r) => r.connections === 32)!;
    const goals = Object.fromEntries(
      (Object.entries(GOALS) as Array<[Exclude<TargetName, 'floor'>, { share: number; p95Times?: number }]>).map(([name, goal]) => {
        const got = at32[name];
        const met = got.share >= goal.share && (goal.p95Times === undefined || got.p95Times <= goal.p95Times);
        return [name, { goal, got: { share: got.share, p95Times: got.p95Times }, met }];
      }),
    );
    const figures = {
      ...runStamp('load'),
      loadAverage: { before: loadBefore.map((l) => round(l, 2)), after: os.loadavg().map((l) => round(l, 2)) },
      warmupSeconds: WARMUP_S,
      measuredSeconds: MEASURE_S,
      dbPoolMax: getEnv().DB_POOL_MAX,
      levels,
      ratios,
      goals,
    };
    appendFigures(RESULTS, figures);

    console.log(`load: ${MEASURE_S} s per target after ${WARMUP_S} s warm-up; ${figures.cores} cores, load average ${figures.loadAverage.before.join(' ')}`);
    for (const { connections, targets: m } of levels) {
      console.log(`  ${connections} connections: ${'target'.padEnd(58)} ${'req/s'.padStart(7)} ${'p50'.padStart(7)} ${'p95'.padStart(7)} ${'p99'.padStart(7)} ms  ${'× floor'.padStart(8)} ${'p95 ×'.padStart(7)}`);
      for (const [name, r] of Object.entries(m) as Array<[TargetName, Measured]>) {
        const vs = name === 'floor' ? { share: 1, p95Times: 1 } : againstFloor(r, m.floor);
        console.log(`  ${''.padEnd(16)}${r.request.padEnd(58)} ${String(r.requestsPerSecond).padStart(7)} ${[r.latencyMs.p50, r.latencyMs.p95, r.latencyMs.p99].map((v) => String(v).padStart(7)).join(' ')}     ${String(vs.share).padStart(8)} ${String(vs.p95Times).padStart(7)}`);
      }
    }
    console.log('  goals at 32 connections (share of the floor\'s req/s, p95 × the floor\'s):');
    for (const [name, g] of Object.entries(goals)) {
      console.log(`    ${name.padEnd(10)} share ${g.got.share} (goal ≥ ${g.goal.share})${g.goal.p95Times ? `, p95 × ${g.got.p95Times} (goal ≤ ${g.goal.p95Times})` : ''}: ${g.met ? 'met' : 'SHORT'}`);
    }
    console.log(`  figures appended to ${RESULTS}`);

    const failed = levels.flatMap((l) => Object.values(l.targets)).filter(failures);
    if (failed.length) {
      for (const m of failed) console.error(`${m.request} at ${m.connections}: not every response had its status: ${JSON.stringify({ unexpected: m.unexpected, errors: m.errors, timeouts: m.timeouts })}`);
      process.exitCode = 1;
    }
  } finally {
    for (const child of helpers) await stop(child);
    await stop(app.child);
    await db.close();
  }
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
