// npm run bench: the request path under load. Autocannon holds 32 connections open against each target in
// turn (a short warm-up, then 10 s measured) and every response must be 2xx:
//   capture      POST /api/v1/counts, a fresh Idempotency-Key each request, as the bench page sends it;
//   estimate     POST /api/v1/counting/estimate, the server-checked preview;
//   session      GET /api/v1/session, signed in: the cheapest JSON route there is (see FLOORS below);
//   primaryKey   a bare MariaDB primary-key lookup behind a plain node:http server (primary-key-server.ts).
// Appends the figures and the ratios of the two routes to the two floors to bench-results/load.json.
import autocannon from 'autocannon';
import { execSync, type ChildProcess } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import { Part, Scale, User } from '../../models';
import { hashPassword } from '../../server/auth/passwords';
import { REFRESH_AFTER_MS } from '../../server/auth/session-options';
import { getDb } from '../../server/db';
import { getEnv } from '../../server/env';
import { freePort, startApp } from '../next-start';
import { signIn } from './bench-sign-in';
import { startPrimaryKeyServer } from './primary-key-floor';

const CONNECTIONS = 32;
const WARMUP_S = 2;
const MEASURE_S = 10;
const RESULTS = 'bench-results/load.json';

// FLOORS. No route of the app answers without the database: health runs SELECT 1, and the route
// wrapper reads the session on every route. A route made only for this bench would be no product
// route, so the JSON floor is GET /api/v1/session signed in, which does exactly what every signed-in
// route does before its own work (unseal the cookie, load the user by primary key through Sequelize)
// and nothing more. The database floor is served over HTTP from its own Node process, as the app is,
// so both floors pay the same loopback, parsing and autocannon costs as the routes: the ratios then
// show what the app adds, not what HTTP costs. A driver loop inside this process would skip HTTP and
// share the event loop with autocannon.

interface Target {
  request: string;
  url: string;
  spec: autocannon.Request;
}

interface Measured {
  request: string;
  responses: number;
  requestsPerSecond: number;
  latencyMs: { p50: number; p95: number; p99: number };
  non2xx: Record<string, number>;
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

function fire(target: Target, seconds: number): Promise<Measured> {
  return new Promise((resolve, reject) => {
    const latencies: number[] = [];
    const non2xx: Record<string, number> = {};
    const instance = autocannon({ url: target.url, connections: CONNECTIONS, duration: seconds, requests: [target.spec] }, (err, result) => {
      if (err) return reject(err);
      // Autocannon's own percentiles stop at p90 and p97.5; these are nearest-rank over every 2xx response.
      latencies.sort((a, b) => a - b);
      const at = (p: number) => round(latencies[Math.max(0, Math.ceil((p / 100) * latencies.length) - 1)] ?? NaN, 2);
      resolve({
        request: target.request,
        responses: latencies.length,
        requestsPerSecond: round(latencies.length / result.duration),
        latencyMs: { p50: at(50), p95: at(95), p99: at(99) },
        non2xx,
        errors: result.errors,
        timeouts: result.timeouts,
      });
    });
    instance.on('response', (_client, status, _bytes, ms) => {
      if (status >= 200 && status < 300) latencies.push(ms);
      else non2xx[status] = (non2xx[status] ?? 0) + 1;
    });
  });
}

const failures = (m: Measured) => Object.values(m.non2xx).reduce((a, b) => a + b, 0) + m.errors + m.timeouts;

function ratio(route: Measured, floor: Measured) {
  // Each reads "times the floor": latency over the floor's, and the floor's throughput over the route's.
  return {
    p50: round(route.latencyMs.p50 / floor.latencyMs.p50, 2),
    p95: round(route.latencyMs.p95 / floor.latencyMs.p95, 2),
    p99: round(route.latencyMs.p99 / floor.latencyMs.p99, 2),
    throughput: round(floor.requestsPerSecond / route.requestsPerSecond, 2),
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
  let floorServer: { url: string; child: ChildProcess } | undefined;
  try {
    floorServer = await startPrimaryKeyServer(world.partId);
    const cookie = await signIn(app.url, world.email, password);
    const signedInAt = Date.now();
    // A browser sends its own origin on a write; rejectCrossSite accepts it as same-origin.
    const headers = { cookie, origin: app.url, 'content-type': 'application/json' };
    const targets: Record<'capture' | 'estimate' | 'session' | 'primaryKey', Target> = {
      capture: {
        request: 'POST /api/v1/counts',
        url: app.url,
        spec: {
          method: 'POST',
          path: '/api/v1/counts',
          headers,
          body: JSON.stringify(captureBody(world.partId, world.scaleId)),
          // A new capture each time: the same key again would be answered as a replay.
          setupRequest: (req) => ({ ...req, headers: { ...req.headers, 'idempotency-key': randomUUID() } }),
        },
      },
      estimate: { request: 'POST /api/v1/counting/estimate', url: app.url, spec: { method: 'POST', path: '/api/v1/counting/estimate', headers, body: JSON.stringify(estimateBody) } },
      session: { request: 'GET /api/v1/session (signed in)', url: app.url, spec: { method: 'GET', path: '/api/v1/session', headers: { cookie } } },
      primaryKey: { request: 'SELECT id FROM parts WHERE id = ? (mariadb pool behind node:http)', url: floorServer.url, spec: { method: 'GET', path: '/' } },
    };
    const loadBefore = os.loadavg();
    const measured = {} as Record<keyof typeof targets, Measured>;
    for (const [name, target] of Object.entries(targets) as Array<[keyof typeof targets, Target]>) {
      // The warm-up loads the route's code and fills the pools; a target that fails it is broken, not slow.
      const warm = await fire(target, WARMUP_S);
      if (failures(warm)) throw new Error(`${target.request} failed during warm-up: ${JSON.stringify({ non2xx: warm.non2xx, errors: warm.errors, timeouts: warm.timeouts })}`);
      measured[name] = await fire(target, MEASURE_S);
      // Past a minute the proxy reseals the cookie on every response to a client that keeps the old
      // one, which a browser never does: the app targets must all run inside that minute.
      if (target.url === app.url && Date.now() - signedInAt > REFRESH_AFTER_MS) throw new Error(`${target.request} ran past the session refresh; shorten the runs`);
    }
    const { capture, estimate, session, primaryKey } = measured;
    const figures = {
      bench: 'load',
      at: new Date().toISOString(),
      commit: execSync('git rev-parse --short HEAD').toString().trim(),
      node: process.version,
      cores: os.availableParallelism(),
      loadAverage: { before: loadBefore.map((l) => round(l, 2)), after: os.loadavg().map((l) => round(l, 2)) },
      connections: CONNECTIONS,
      warmupSeconds: WARMUP_S,
      measuredSeconds: MEASURE_S,
      dbPoolMax: getEnv().DB_POOL_MAX,
      targets: measured,
      ratios: {
        captureOverSession: ratio(capture, session),
        captureOverPrimaryKey: ratio(capture, primaryKey),
        estimateOverSession: ratio(estimate, session),
        estimateOverPrimaryKey: ratio(estimate, primaryKey),
      },
    };
    const previous = existsSync(RESULTS) ? (JSON.parse(readFileSync(RESULTS, 'utf8')) as unknown[]) : [];
    writeFileSync(RESULTS, JSON.stringify([...previous, figures], null, 2) + '\n');

    console.log(`load: ${CONNECTIONS} connections, ${MEASURE_S} s each after ${WARMUP_S} s warm-up; ${figures.cores} cores, load average ${figures.loadAverage.before.join(' ')}`);
    console.log(`  ${'target'.padEnd(66)} ${'req/s'.padStart(7)} ${'p50'.padStart(7)} ${'p95'.padStart(7)} ${'p99'.padStart(7)} ms`);
    for (const m of Object.values(measured)) {
      console.log(`  ${m.request.padEnd(66)} ${String(m.requestsPerSecond).padStart(7)} ${[m.latencyMs.p50, m.latencyMs.p95, m.latencyMs.p99].map((v) => String(v).padStart(7)).join(' ')}`);
    }
    console.log('  ratios (× the floor in p50 / p95 / p99 latency, and in throughput):');
    for (const [name, r] of Object.entries(figures.ratios)) console.log(`    ${name.padEnd(24)} ${r.p50} / ${r.p95} / ${r.p99}, throughput ${r.throughput}`);
    console.log(`  figures appended to ${RESULTS}`);

    const failed = Object.values(measured).filter(failures);
    if (failed.length) {
      for (const m of failed) console.error(`${m.request}: not every response was 2xx: ${JSON.stringify({ non2xx: m.non2xx, errors: m.errors, timeouts: m.timeouts })}`);
      process.exitCode = 1;
    }
  } finally {
    if (floorServer) await stop(floorServer.child);
    await stop(app.child);
    await db.close();
  }
}

function round(n: number, digits = 1): number {
  return Math.round(n * 10 ** digits) / 10 ** digits;
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
