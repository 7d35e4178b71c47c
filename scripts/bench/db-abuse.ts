// npm run bench: does an attack on one route stall everyone else? A watcher asks GET /api/v1/health
// one request at a time (the framework floor: a route handler and SELECT 1) and keeps each latency,
// first with the app idle, then during each of:
//   body flood    8 parallel 9.5 MB JSON bodies to POST /api/v1/session, again and again (no sign-in);
//   token flood   16 parallel POST /api/v1/invitations/accept with random tokens;
//   label flood   one 5 000-label print batch (POST /api/v1/print-jobs), until every job is sent.
// The body flood is also sent to the floor (primary-key-server.ts: node:http reading each body to its end
// and answering 413, and one primary-key lookup per GET), watched the same way: what this machine can do
// at best while the same bytes arrive. Goals (issue 15): health p95 under 100 ms during the body flood
// (reported beside the floor's own figure and the ratio to it), and under 3× its idle p95 during the label
// flood. Appends the figures to bench-results/abuse.json.

import { randomBytes, randomUUID } from 'node:crypto';

import { Bin, Part, User } from '../../models';
import { hashPassword } from '../../server/auth/passwords';
import { getDb } from '../../server/db';
import { freePort, startApp } from '../next-start';
import { signIn } from './bench-sign-in';
import { startPrimaryKeyServer } from './primary-key-floor';
import { appendFigures, runStamp } from './figures';

const RESULTS = 'bench-results/abuse.json';
const IDLE_S = 8;
const FLOOD_S = 10;
const LABELS = 5_000;

interface Watched {
  samples: number;
  p50: number;
  p95: number;
  max: number;
  non2xx: number;
}

function percentile(sorted: number[], p: number): number {
  return sorted.length ? sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)] : NaN;
}

// Health, asked again as soon as it answers, until `until` resolves.
async function watchHealth(url: string, until: Promise<unknown>, path = '/api/v1/health'): Promise<Watched> {
  let done = false;
  void until.finally(() => (done = true));
  const ms: number[] = [];
  let non2xx = 0;
  while (!done) {
    const t = performance.now();
    const res = await fetch(`${url}${path}`);
    await res.arrayBuffer();
    ms.push(performance.now() - t);
    if (!res.ok) non2xx++;
    await new Promise((r) => setTimeout(r, 20));
  }
  const sorted = [...ms].sort((a, b) => a - b);
  return { samples: ms.length, p50: round(percentile(sorted, 50)), p95: round(percentile(sorted, 95)), max: round(sorted.at(-1) ?? NaN), non2xx };
}

const seconds = (s: number) => new Promise((r) => setTimeout(r, s * 1000));

// Keeps `parallel` requests going until `stopAt`, counting answers by status.
async function flood(parallel: number, stopAt: number, send: () => Promise<Response>): Promise<Record<string, number>> {
  const statuses: Record<string, number> = {};
  const lane = async () => {
    while (Date.now() < stopAt) {
      const status = await send().then(
        async (r) => (await r.arrayBuffer(), String(r.status)),
        () => 'connection closed',
      );
      statuses[status] = (statuses[status] ?? 0) + 1;
    }
  };
  await Promise.all(Array.from({ length: parallel }, lane));
  return statuses;
}

// About 9.5 MB of JSON with 800 000 keys, as measured in the issue.
function hugeBody(): string {
  const keys: string[] = [];
  for (let i = 0; i < 800_000; i++) keys.push(`"k${i.toString(36)}":1`);
  return `{"email":"a@example.test","password":"x",${keys.join(',')}}`;
}

async function binsForLabels(count: number): Promise<{ partId: number; binIds: number[] }> {
  const part = await Part.create({
    partNumber: `ABUSE-${randomUUID().slice(0, 8)}`.toUpperCase(),
    description: 'label flood part',
    countingMethod: 'scale',
    apwG: null,
    apwSampleSize: null,
    pieceSpread: null,
    photoFile: null,
  });
  const rows = Array.from({ length: count }, (_, i) => ({
    code: `XB-${String(1 + Math.floor(i / 891)).padStart(2, '0')}-${1 + (Math.floor(i / 99) % 9)}-${String(1 + (i % 99)).padStart(2, '0')}`,
    partId: part.id,
    containerId: null,
    bookQuantity: 100,
    lastCountedAt: null,
  }));
  const bins = await Bin.bulkCreate(rows);
  return { partId: part.id, binIds: bins.map((b) => b.id) };
}

async function main(): Promise<void> {
  const db = getDb();
  const password = randomUUID();
  const clerk = await User.create({
    email: `abuse-${randomUUID().slice(0, 8)}@example.test`,
    name: 'Abuse Bench Clerk',
    role: 'clerk',
    passwordHash: await hashPassword(password),
    active: true,
  });
  const { partId, binIds } = await binsForLabels(LABELS);
  const printerUrl = `ipp://127.0.0.1:${process.env.PRINTER_PORT ?? 8641}/printers/labels`;
  const app = await startApp({ TF_JOBS: '0', SMTP_HOST: '127.0.0.1', SMTP_PORT: String(await freePort()), PRINTER_URL: printerUrl }, 'bench-results');
  try {
    const cookie = await signIn(app.url, clerk.email, password);
    await watchHealth(app.url, seconds(2)); // warm-up
    const idle = await watchHealth(app.url, seconds(IDLE_S));

    const body = hugeBody();
    const bodyFlood = (url: string) =>
      flood(8, Date.now() + FLOOD_S * 1000, () => fetch(`${url}/api/v1/session`, { method: 'POST', headers: { 'content-type': 'application/json' }, body }));
    const bodyStatuses = bodyFlood(app.url);
    const duringBodies = await watchHealth(app.url, bodyStatuses);

    const floor = await startPrimaryKeyServer(partId);
    let floorIdle: Watched;
    let floorDuringBodies: Watched;
    try {
      await watchHealth(floor.url, seconds(2), '/');
      floorIdle = await watchHealth(floor.url, seconds(IDLE_S), '/');
      floorDuringBodies = await watchHealth(floor.url, bodyFlood(floor.url), '/');
    } finally {
      floor.child.kill('SIGTERM');
    }

    const tokenStop = Date.now() + FLOOD_S * 1000;
    const tokenStatuses = flood(16, tokenStop, () =>
      fetch(`${app.url}/api/v1/invitations/accept`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ token: randomBytes(32).toString('base64url'), password: 'a new password 1' }),
      }),
    );
    const duringTokens = await watchHealth(app.url, tokenStatuses);

    const started = Date.now();
    const queued = await fetch(`${app.url}/api/v1/print-jobs`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: app.url, cookie },
      body: JSON.stringify({ template: 'bin', stock: '2x1in', ids: binIds }),
    });
    if (queued.status !== 202) throw new Error(`print batch refused: ${queued.status} ${await queued.text()}`);
    const { batchId } = (await queued.json()) as { batchId: string };
    const batchDone = (async () => {
      for (;;) {
        const res = await fetch(`${app.url}/api/v1/print-jobs?batch=${batchId}`, { headers: { cookie } });
        const { jobs } = (await res.json()) as { jobs: Array<{ status: string }> };
        if (jobs.every((j) => j.status !== 'queued')) return jobs;
        if (Date.now() - started > 300_000) throw new Error('the print batch did not finish in 5 minutes');
        await seconds(1);
      }
    })();
    const duringLabels = await watchHealth(app.url, batchDone);
    const jobs = await batchDone;

    const figures = {
      ...runStamp('abuse'),
      health: { idle, duringBodies, duringTokens, duringLabels },
      floor: { idle: floorIdle, duringBodies: floorDuringBodies },
      attacks: {
        bodyFlood: { parallel: 8, bodyBytes: Buffer.byteLength(body), statuses: await bodyStatuses },
        tokenFlood: { parallel: 16, statuses: await tokenStatuses },
        labelFlood: { labels: LABELS, jobs: jobs.length, statuses: countBy(jobs.map((j) => j.status)), seconds: round((Date.now() - started) / 1000) },
      },
      goals: {
        bodyFloodHealthP95UnderMs100: duringBodies.p95 < 100,
        labelFloodHealthP95UnderThreeTimesIdle: duringLabels.p95 < 3 * idle.p95,
      },
      ratios: {
        bodyFloodOverFloor: round(duringBodies.p95 / floorDuringBodies.p95, 2),
        bodyFloodOverIdle: round(duringBodies.p95 / idle.p95, 2),
        tokenFloodOverIdle: round(duringTokens.p95 / idle.p95, 2),
        labelFloodOverIdle: round(duringLabels.p95 / idle.p95, 2),
      },
    };
    appendFigures(RESULTS, figures);
    console.log(
      `abuse: health p50/p95/max ms — idle ${fmt(idle)}; body flood ${fmt(duringBodies)}; token flood ${fmt(duringTokens)}; label flood ${fmt(duringLabels)}`,
    );
    console.log(
      `  floor (node:http + primary-key lookup): idle ${fmt(floorIdle)}; body flood ${fmt(floorDuringBodies)}; app/floor p95 during the body flood ${figures.ratios.bodyFloodOverFloor}`,
    );
    console.log(
      `  body flood answers ${JSON.stringify(figures.attacks.bodyFlood.statuses)}; token flood ${JSON.stringify(figures.attacks.tokenFlood.statuses)}; labels ${JSON.stringify(figures.attacks.labelFlood)}`,
    );
    console.log(`  goals ${JSON.stringify(figures.goals)}`);
  } finally {
    app.child.kill('SIGTERM');
    await db.close();
  }
}

const fmt = (w: Watched) => `${w.p50}/${w.p95}/${w.max} (${w.samples} asks)`;
const countBy = (values: string[]) => values.reduce<Record<string, number>>((acc, v) => ({ ...acc, [v]: (acc[v] ?? 0) + 1 }), {});

function round(n: number, digits = 1): number {
  return Math.round(n * 10 ** digits) / 10 ** digits;
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
