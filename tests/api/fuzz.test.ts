// Fuzzes every route handler that takes input (a body, an upload, a query string or ids in its path)
// with fast-check. For every request: never a 5xx; an error keeps the JSON shape {error: {code, message}}
// without internals; and a refused request (4xx) writes nothing to the database.
// The handlers are read from app/api, so a new route is fuzzed without being listed here (and the run
// fails until it has a sample). Each is called by a role its `access` lets in. A valid sample per route
// (below) lets the mutations get past the first check to the deeper ones, and every field of it is
// also swept through column-breaking values before the random requests.
// Replay a failure with the seed fast-check prints: TF_FUZZ_SEED=<seed> (and TF_FUZZ_RUNS for more runs).
import { randomUUID } from 'node:crypto';
import fc from 'fast-check';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiRouteFiles } from '../helpers/route-files';
import { ROLE_PERMISSIONS, ROLES, type Permission, type Role } from '../../lib/roles';
import { BOM_CSV_COLUMNS } from '../../lib/contracts/kits';
import { PART_CSV_COLUMNS } from '../../lib/contracts/parts';
import { PieceWeightSample } from '../../models';
import { createPart, createScale, createTestWeight, createUser, stockPart, TEST_PASSWORD, testDb, unique } from '../helpers/db';
import { anonymous, signedIn, type Agent } from '../helpers/http';
import { releasedOrder } from '../helpers/orders';
import { waitForBatch } from '../helpers/printer';
import { utcDay } from '../helpers/days';

const SEED = Number(process.env.TF_FUZZ_SEED ?? 20260408);
const RUNS = Number(process.env.TF_FUZZ_RUNS ?? 30);

// ---- the handlers, read from the file system -------------------------------------------------

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
interface Handler {
  key: string; // "POST /api/v1/parts/[id]/samples"
  method: Method;
  route: string;
  builtWithRoute: boolean; // false: exported but not built with route({...}), so nothing below can read it
  access: string;
  params: string[];
  query: boolean;
  body: boolean;
  uploadField?: string; // multipart handlers: the form field they read
}

const HANDLERS: Handler[] = apiRouteFiles().flatMap(({ route, source }) => {
  const exports = [...source.matchAll(/export const (GET|POST|PATCH|PUT|DELETE)\b/g)];
  return exports.map((m, i) => {
    const method = m[1] as Method;
    const text = source.slice(m.index, exports[i + 1]?.index ?? source.length);
    // The spec object of route({ access, body, query, params }) holds no nested braces.
    const spec = /^export const \w+ = route\(\{([^}]*)\}/.exec(text)?.[1];
    return {
      key: `${method} ${route}`,
      method,
      route,
      builtWithRoute: spec !== undefined,
      access: /access: '([^']+)'/.exec(spec ?? '')?.[1] ?? '',
      params: [...route.matchAll(/\[(\w+)\]/g)].map((p) => p[1]),
      query: /\bquery\b/.test(spec ?? ''),
      body: /\bbody\b/.test(spec ?? ''),
      uploadField: /form\.get\('([^']+)'\)/.exec(text)?.[1],
    };
  });
});

// A GET without a query or ids takes no input; everything else is fuzzed.
const FUZZED = HANDLERS.filter((h) => h.method !== 'GET' || h.params.length > 0 || h.query);

// The least privileged role the handler lets in, so requests reach validation; null: signed out.
function roleFor(h: Handler): Role | null {
  if (h.access === 'public') return null;
  if (h.access === 'signed-in') return ROLES[0];
  return ROLE_PERMISSIONS[h.access as Permission][0];
}

// ---- the world the samples point into ------------------------------------------------------------

interface World {
  agents: Map<Role, Agent>;
  ids: Record<string, number>; // by the path segment before the id: parts, scales, items, …
  part: { id: number; partNumber: string };
  scale: { id: number };
  spareScale: { id: number };
  sparePart: { id: number };
  bin: { id: number; code: string; version: number };
  container: { id: number };
  kit: { id: number };
  spareKit: { id: number }; // no orders, so its parts may change
  order: { id: number; lines: Array<{ id: number }> };
  drafts: Array<{ id: number }>; // one to release, one to cancel
  settingsId: number;
  user: { id: number; email: string };
  weight: { id: number };
  today: string;
}

interface Sample {
  bodies?: object[]; // valid bodies: each is mutated, mostly one field at a time
  extra?: fc.Arbitrary<object>; // route-specific bodies (CSV files with hostile cells)
  query?: Record<string, string>; // a valid query string
  ids?: Record<string, number>; // path ids when not the resource's own fixture
  headers?: () => Record<string, string>; // fresh for each request
  file?: { name: string; type: string; bytes: Buffer }; // a valid upload
  ownSession?: boolean; // the handler ends its caller's sessions: each request is sent by someone signed in for it
}

// A value that must be new on each request (unique names and codes), made as the body is sent:
// a repeat would stop every request after the first success at 409 before the deeper checks.
const RUN = randomUUID().slice(0, 6).toUpperCase();
let serial = 0;
class Fresh {
  constructor(
    readonly label: string,
    readonly make: (n: number) => string,
  ) {}
  toJSON(): string {
    return this.make(++serial);
  }
  [fc.toStringMethod](): string {
    return `fresh ${this.label}`;
  }
}
const fresh = (label: string, make: (n: number) => string) => new Fresh(label, make);
const freshCode = (prefix: string) => fresh(`${prefix} code`, (n) => `${prefix}-${RUN}-${n}`);

// A record's version as it is just before sending, for the same reason: a stale one answers 409 at once.
class Live {
  constructor(
    readonly table: string,
    readonly id: number,
  ) {}
  [fc.toStringMethod](): string {
    return `current version of ${this.table} ${this.id}`;
  }
}

// Enough of a PNG and a PDF for the uploads' content checks (the same bytes the upload tests send).
const PNG = Buffer.from('89504e470d0a1a0a0000000d4948445200000001000000010806000000', 'hex');
const PDF = Buffer.from('%PDF-1.4\n%fuzz certificate\n');

const SAMPLES: Record<string, (w: World) => Sample> = {
  'POST /api/v1/session': (w) => ({
    bodies: [
      { email: fresh('e-mail', (n) => `fuzz-${RUN}-${n}@example.test`), password: 'not the password' },
      { email: w.user.email, password: TEST_PASSWORD },
    ],
  }),
  'DELETE /api/v1/session': () => ({}),
  'DELETE /api/v1/session/everywhere': () => ({ ownSession: true }),
  'DELETE /api/v1/users/[id]/sessions': () => ({}),
  // The catch-all for addresses no route serves reads nothing; whatever comes, it answers 404.
  'POST /api/[...path]': () => ({}),
  'PUT /api/[...path]': () => ({}),
  'PATCH /api/[...path]': () => ({}),
  'DELETE /api/[...path]': () => ({}),
  'POST /api/v1/invitations/accept': () => ({ bodies: [{ token: 'a'.repeat(40), password: 'a long new password' }] }),
  'POST /api/v1/users': () => ({ bodies: [{ name: 'Fuzz Invitee', email: fresh('e-mail', (n) => `fuzz-${RUN}-${n}@example.test`), role: 'operator' }] }),
  'PATCH /api/v1/users/[id]': (w) => ({ bodies: [{ role: 'clerk', active: true, version: new Live('users', w.user.id) }] }),
  'POST /api/v1/users/[id]/invitation': () => ({}),
  'PATCH /api/v1/settings': (w) => ({
    bodies: [
      {
        siteName: 'Fuzzed works',
        displayUnit: 'g',
        defaultPieceSpread: 0.02,
        stabilityWindowMs: 1000,
        varianceThresholdPct: 2,
        varianceThresholdPcs: 5,
        version: new Live('site_settings', w.settingsId),
      },
    ],
  }),
  'POST /api/v1/counting/estimate': () => ({
    bodies: [
      {
        unit: 'g',
        scale: { division: 0.1, repeatability: 0.05, max: 6000, min: 2 },
        sample: { quantity: 10, netWeight: 5 },
        netWeight: 50,
        sampleOnPan: true,
        pieceSpread: 0.01,
        targetQuantity: 100,
      },
    ],
  }),
  'POST /api/v1/scales': () => ({
    bodies: [
      {
        name: freshCode('SCALE'),
        location: 'bench 9',
        unit: 'g',
        capacity: 6000,
        minLoad: 20,
        division: 0.1,
        verificationInterval: 1,
        accuracyClass: 'III',
        repeatability: 0.05,
        connection: { kind: 'simulator', settleMs: 250, driftPerMinute: 0, rateHz: 20 },
      },
      {
        name: freshCode('SERIAL'),
        unit: 'kg',
        capacity: 30,
        division: 0.001,
        accuracyClass: 'III',
        connection: {
          kind: 'serial',
          baudRate: 9600,
          dataBits: 8,
          parity: 'none',
          stopBits: 1,
          lineFormat: 'plain-grams',
          mode: 'polled',
          pollRequest: 'P\\r\\n',
          pollIntervalMs: 200,
        },
      },
      {
        name: freshCode('ADC'),
        unit: 'lb',
        capacity: 100,
        division: 0.01,
        accuracyClass: 'IIII',
        connection: { kind: 'raw_adc', bits: 24, fullScaleVolts: 5, gain: 128, reversedExcitation: false, averaging: 4 },
      },
    ],
  }),
  'PATCH /api/v1/scales/[id]': (w) => ({
    ids: { id: w.spareScale.id },
    bodies: [
      {
        name: freshCode('SPARE'),
        location: 'bench 8',
        capacity: 6000,
        division: 0.1,
        repeatability: null,
        connection: { kind: 'keyed' },
        version: new Live('scales', w.spareScale.id),
      },
    ],
  }),
  'POST /api/v1/containers': () => ({ bodies: [{ name: freshCode('TOTE'), kind: 'tote', unit: 'g', tare: 120.5 }] }),
  'PATCH /api/v1/containers/[id]': (w) => ({
    bodies: [{ name: freshCode('BAG'), kind: 'bag', unit: 'kg', tare: 0.12, version: new Live('containers', w.container.id) }],
  }),
  'GET /api/v1/parts': () => ({ query: { q: 'FZ', sort: 'description', dir: 'desc', page: '1', pageSize: '50' } }),
  'POST /api/v1/parts': () => ({
    bodies: [{ partNumber: fresh('part number', (n) => `fz-${RUN}/${n}`.toLowerCase()), description: 'Fuzz washer', countingMethod: 'scale' }],
  }),
  'GET /api/v1/parts/export': () => ({ query: { q: 'FZ', sort: 'updatedAt', dir: 'asc' } }),
  'POST /api/v1/parts/import': () => {
    const csv = fresh('parts CSV', (n) => `${PART_CSV_COLUMNS.join(',')}\nFZ-${RUN}-B${n},Fuzz bolt,scale\nFZ-${RUN}-N${n},"Fuzz nut, M4",hand\n`);
    return {
      bodies: [
        { csv, commit: false },
        { csv, commit: true },
      ],
      extra: csvBody(PART_CSV_COLUMNS),
    };
  },
  'GET /api/v1/parts/[id]': () => ({}),
  'PATCH /api/v1/parts/[id]': (w) => ({
    ids: { id: w.sparePart.id },
    bodies: [{ description: 'Fuzz spare part', countingMethod: 'hand', version: new Live('parts', w.sparePart.id) }],
  }),
  'GET /api/v1/parts/[id]/samples': () => ({}),
  'POST /api/v1/parts/[id]/samples': (w) => ({ bodies: [{ scaleId: w.scale.id, unit: 'g', quantity: 4, netWeight: 2, increments: [0.5, 0.5, 0.5, 0.5] }] }),
  'POST /api/v1/parts/[id]/samples/[sampleId]/decision': () => ({ bodies: [{ decision: 'reject' }] }),
  'GET /api/v1/parts/[id]/photo': () => ({}),
  'PUT /api/v1/parts/[id]/photo': () => ({ file: { name: 'washer.png', type: 'image/png', bytes: PNG } }),
  'GET /api/v1/counts': (w) => ({
    query: { partId: String(w.part.id), scaleId: String(w.scale.id), purpose: 'part', from: w.today, to: `${w.today}T23:59:59Z`, page: '1', pageSize: '20' },
  }),
  'GET /api/v1/counts/export': (w) => ({
    query: { partNumber: w.part.partNumber, scaleId: String(w.scale.id), purpose: 'part', from: w.today, to: w.today, notExact: '1', page: '1' },
  }),
  'POST /api/v1/counts': (w) => {
    const weighing = {
      partId: w.part.id,
      scaleId: w.scale.id,
      unit: 'g',
      gross: 25,
      tare: 0,
      sample: { quantity: 20, netWeight: 10 },
      sampleOnPan: false,
      stable: true,
    };
    return {
      bodies: [
        { purpose: 'part', ...weighing, containerId: null, targetQuantity: 50 },
        { purpose: 'kit_line', ...weighing, orderLineId: w.order.lines[0].id },
        { purpose: 'bin', ...weighing, binId: w.bin.id, binVersion: w.bin.version },
      ],
      headers: () => ({ 'Idempotency-Key': randomUUID() }),
    };
  },
  'POST /api/v1/kits': (w) => ({
    bodies: [
      {
        code: freshCode('kit'),
        revision: 'a',
        description: 'Fuzz kit',
        components: [{ partId: w.part.id, quantity: 2, toleranceBelow: 0, toleranceAbove: 1 }],
      },
    ],
  }),
  'POST /api/v1/kits/import': (w) => {
    const csv = fresh('BOM CSV', (n) => `${BOM_CSV_COLUMNS.join(',')}\nFZ-BOM-${RUN}-${n},A,Fuzz bom,${w.part.partNumber},2,0,1\n`);
    return {
      bodies: [
        { csv, commit: false },
        { csv, commit: true },
      ],
      extra: csvBody(BOM_CSV_COLUMNS, w.part.partNumber),
    };
  },
  'GET /api/v1/kits/[id]': () => ({}),
  'PATCH /api/v1/kits/[id]': (w) => ({
    ids: { id: w.spareKit.id },
    bodies: [{ description: 'Fuzz kit', active: true, components: [{ partId: w.part.id, quantity: 4 }], version: new Live('kits', w.spareKit.id) }],
  }),
  'POST /api/v1/kits/[id]/revisions': () => ({ bodies: [{ revision: fresh('revision', (n) => n.toString(36)) }] }),
  'GET /api/v1/orders': () => ({ query: { status: 'open' } }),
  'POST /api/v1/orders': (w) => ({ bodies: [{ kitId: w.kit.id, quantity: 2, dueDate: '2031-01-31' }] }),
  'GET /api/v1/orders/[id]': () => ({}),
  'GET /api/v1/orders/[id]/availability': () => ({}),
  'POST /api/v1/orders/[id]/release': (w) => ({ ids: { id: w.drafts[0].id }, bodies: [{ version: new Live('build_orders', w.drafts[0].id) }] }),
  'POST /api/v1/orders/[id]/cancel': (w) => ({ ids: { id: w.drafts[1].id }, bodies: [{ version: new Live('build_orders', w.drafts[1].id) }] }),
  // The world's released order has no uncertain line: the answer is a 422 the fuzzer checks writes nothing.
  'POST /api/v1/orders/[id]/lines/[lineId]/recount': (w) => ({
    ids: { id: w.order.id, lineId: w.order.lines[0].id },
    bodies: [{ version: new Live('build_orders', w.order.id) }],
  }),
  'POST /api/v1/orders/[id]/complete': (w) => ({ bodies: [{ version: new Live('build_orders', w.order.id), overrideReason: 'fuzzing the complete action' }] }),
  'GET /api/v1/bins': (w) => ({ query: { code: w.bin.code, partId: String(w.part.id) } }),
  'POST /api/v1/bins': (w) => ({
    bodies: [
      {
        code: fresh(
          'bin code',
          (n) =>
            `${RUN.replace(/[^A-Z]/g, '')
              .padEnd(2, 'Q')
              .slice(
                0,
                2,
              )}-${String(1 + (n % 99)).padStart(2, '0')}-${1 + (Math.floor(n / 99) % 9)}-${String(1 + (Math.floor(n / 891) % 99)).padStart(2, '0')}`,
        ),
        partId: w.part.id,
        containerId: w.container.id,
        bookQuantity: 10,
        abcClass: 'B',
      },
    ],
  }),
  'GET /api/v1/bins/[id]/label.pdf': () => ({ query: { stock: '4x2in' } }),
  'POST /api/v1/calibration/evaluate': () => ({
    bodies: [
      {
        accuracyClass: 'III',
        verificationInterval: 0.5,
        capacity: 6000,
        unit: 'g',
        stage: 'initial',
        points: [{ load: 1000, indication: 1000.5 }],
        repeatability: { load: 3000, indications: [3000, 3000.5, 3000] },
        eccentricity: { load: 2000, indications: [2000, 2000.5, 1999.5, 2000] },
      },
    ],
  }),
  'POST /api/v1/test-weights': () => ({
    bodies: [{ identifier: freshCode('tw'), nominal: 500, unit: 'g', weightClass: 'F1', certificateNumber: 'CAL-FZ', dueAt: '2031-06-30' }],
  }),
  'GET /api/v1/test-weights/[id]/certificate': () => ({}),
  'PUT /api/v1/test-weights/[id]/certificate': () => ({ file: { name: 'certificate.pdf', type: 'application/pdf', bytes: PDF } }),
  'GET /api/v1/scales/[id]': () => ({}),
  'GET /api/v1/scales/[id]/calibrations': () => ({}),
  'POST /api/v1/scales/[id]/calibrations': (w) => ({
    ids: { id: w.spareScale.id },
    bodies: [
      {
        stage: 'in_service',
        performedAt: w.today,
        unit: 'g',
        points: [{ load: 100, indication: 100, testWeightIds: [w.weight.id] }],
        repeatability: { load: 100, indications: [100, 100.1] },
        eccentricity: { load: 100, indications: [100, 100] },
        zeroOk: true,
        tareOk: true,
        intervalDays: 180,
        notes: 'fuzz',
      },
    ],
  }),
  'POST /api/v1/scales/[id]/lock': (w) => ({ ids: { id: w.spareScale.id }, bodies: [{ reason: 'fuzzing the lock-out' }] }),
  'POST /api/v1/jobs/calibration-reminders': () => ({}),
  'GET /api/v1/audits/sampling-plan': () => ({ query: { lotSize: '500', level: 'II', aql: '1.0' } }),
  'POST /api/v1/audits': (w) => ({
    bodies: [{ population: { from: w.today, to: w.today, partId: w.part.id, scaleId: w.scale.id, purpose: 'part' }, level: 'II', aql: 2.5, seed: 12345 }],
  }),
  'GET /api/v1/audits/[id]': () => ({}),
  'PUT /api/v1/audits/[id]/items/[itemId]': () => ({ bodies: [{ handCount: 50 }] }),
  'GET /api/v1/reports/accuracy': (w) => ({ query: { from: w.today, to: w.today, by: 'operator', format: 'csv' } }),
  'GET /api/v1/bin-counts': (w) => ({ query: { status: 'pending', binId: String(w.bin.id) } }),
  'POST /api/v1/bin-counts/[id]/decision': () => ({ bodies: [{ decision: 'reject', note: 'fuzz' }] }),
  'POST /api/v1/labels': (w) => ({
    bodies: [
      { template: 'bin', stock: '4x2in', ids: [w.bin.id] },
      { template: 'part', stock: 'letter-30up', ids: [w.part.id, w.part.id] },
      { template: 'kit', stock: '4x6in', ids: [w.order.id] },
    ],
  }),
  'GET /api/v1/print-jobs': () => ({ query: { batch: randomUUID(), limit: '10' } }),
  'POST /api/v1/print-jobs': (w) => ({ bodies: [{ template: 'bin', stock: '2x1in', ids: [w.bin.id], printer: 'labels' }] }),
};

// ---- hostile values ---------------------------------------------------------------------------------

// A value that is large to send but short to print in fast-check's counterexample.
class Shown<T> {
  constructor(
    readonly value: T,
    readonly label: string,
  ) {}
  toJSON(): T {
    return this.value;
  }
  [fc.toStringMethod](): string {
    return this.label;
  }
}
const repeated = (unit: string, times: number) => new Shown(unit.repeat(times), `${JSON.stringify(unit)}×${times}`);

const edgeNumber = fc.oneof(
  {
    weight: 3,
    arbitrary: fc.constantFrom(
      0,
      -0,
      -1,
      1,
      0.1,
      0.5,
      1.5,
      -1.5,
      1e-7,
      1e-10,
      1e-300,
      5e-324,
      2 ** 31 - 1,
      2 ** 31,
      2 ** 32,
      2 ** 53 - 1,
      2 ** 53 + 2,
      1e15,
      1e20,
      1e21,
      1e100,
      1e300,
      Number.MAX_VALUE,
      -Number.MAX_VALUE,
      9_999_999,
      10_000_000,
      10_000_001,
      99_999_999.999_999,
      100_000_000,
      100_001,
      NaN,
      Infinity,
    ),
  },
  { weight: 1, arbitrary: fc.double({ noNaN: true, noDefaultInfinity: true }) },
  { weight: 1, arbitrary: fc.integer({ min: -(2 ** 31), max: 2 ** 32 }) },
);
const numericString = fc.constantFrom('0', '1', '-1', '1.5', '1e3', '1e309', '-1e309', 'NaN', 'Infinity', '0x10', '1,5', ' 1 ', '١٢', '1_000', '');
const edgeString = fc.oneof(
  fc.constantFrom(
    '',
    ' ',
    '   padded   ',
    '\u0000',
    'a\u0000b',
    '\r\n',
    '\t',
    'null',
    'undefined',
    'true',
    '[]',
    '{}',
    "' OR '1'='1",
    '1; DROP TABLE parts; --',
    '" OR ""="',
    '\\',
    "\\'",
    '%',
    '_',
    '%00',
    '<script>alert(1)</script>',
    '<img src=x onerror=alert(1)>',
    '"><svg onload=alert(1)>',
    '${7*7}',
    '{{7*7}}',
    '../../../etc/passwd',
    '=HYPERLINK("http://x")',
    '😀',
    '👩‍👩‍👧‍👦',
    'Ω≈ç√',
    '\u202eevil',
    '\uFEFF',
    '\uD800',
    'ß',
    'ﬀ',
    'İ',
    'A-1',
    '__proto__',
    'constructor',
  ),
  fc.string({ unit: 'binary', maxLength: 30 }),
);
const longString = fc
  .tuple(
    fc.constantFrom(
      2,
      8,
      20,
      21,
      40,
      41,
      60,
      61,
      64,
      65,
      80,
      81,
      100,
      101,
      120,
      121,
      200,
      201,
      254,
      255,
      256,
      300,
      301,
      500,
      501,
      1000,
      1001,
      5000,
      65_536,
      1_000_000,
    ),
    fc.constantFrom('x', 'A', '9', '😀', 'ß', 'é', ' '),
  )
  .map(([n, unit]) => repeated(unit, unit === '😀' ? Math.min(n, 70_000) : n));
const DANGEROUS_KEYS = ['__proto__', 'constructor', 'prototype', 'toString', 'valueOf', 'hasOwnProperty', 'then'];
const key = fc.oneof(fc.constantFrom(...DANGEROUS_KEYS), fc.string({ maxLength: 12 }));

// Builds the object with own keys only: "__proto__" stays a key instead of setting the prototype.
function objectOf(entries: Array<[string, unknown]>): Record<string, unknown> {
  const o: Record<string, unknown> = {};
  for (const [k, v] of entries) Object.defineProperty(o, k, { value: v, enumerable: true, writable: true, configurable: true });
  return o;
}

function nested(depth: number, kind: 'array' | 'object'): Shown<unknown> {
  let v: unknown = 1;
  for (let i = 0; i < depth; i++) v = kind === 'array' ? [v] : { a: v };
  return new Shown(v, `${kind} nested ${depth} deep`);
}

const leaf = fc.oneof(edgeNumber, edgeString, longString, numericString, fc.constantFrom(null, true, false));
const bigArrays = fc.constantFrom(
  new Shown(Array(5001).fill(1), '[1×5001]'),
  new Shown(Array(100_000).fill(0), '[0×100000]'),
  nested(2000, 'array'),
  nested(2000, 'object'),
);
const hostile: fc.Arbitrary<unknown> = fc.letrec((tie) => ({
  value: fc.oneof({ depthSize: 'small', withCrossShrink: true }, leaf, tie('array'), tie('object'), bigArrays),
  array: fc.array(tie('value'), { maxLength: 4 }),
  object: fc.array(fc.tuple(key, tie('value')), { maxLength: 4 }).map(objectOf),
})).value;

// A replacement for a field, mostly of the field's own type so the value reaches the checks behind it.
function likeOf(original: unknown): fc.Arbitrary<unknown> {
  if (typeof original === 'number' || original instanceof Live)
    return fc.oneof({ weight: 4, arbitrary: edgeNumber }, { weight: 1, arbitrary: numericString }, { weight: 1, arbitrary: hostile });
  if (typeof original === 'string' || original instanceof Fresh)
    return fc.oneof({ weight: 4, arbitrary: fc.oneof(edgeString, longString) }, { weight: 1, arbitrary: hostile });
  if (typeof original === 'boolean') return fc.oneof(fc.constantFrom('true', 'false', 1, 0, null), hostile);
  if (Array.isArray(original)) return fc.oneof(fc.constant([]), bigArrays, fc.array(edgeNumber, { maxLength: 5 }), hostile);
  return hostile;
}

// ---- mutations of a valid sample ---------------------------------------------------------------

type Path = Array<string | number>;
type Mutation =
  | { op: 'set'; path: Path; value: unknown }
  | { op: 'delete'; path: Path }
  | { op: 'add'; path: Path; key: string; value: unknown }
  | { op: 'wrap'; path: Path };

// Markers (Shown, Fresh, Live) are leaves, not objects to walk into.
const isPlainObject = (v: unknown): v is Record<string, unknown> =>
  typeof v === 'object' && v !== null && [Object.prototype, null].includes(Object.getPrototypeOf(v));

function pathsOf(value: unknown, prefix: Path = []): Array<[Path, unknown]> {
  const here: [Path, unknown] = [prefix, value];
  if (Array.isArray(value)) return [here, ...value.flatMap((v, i) => pathsOf(v, [...prefix, i]))];
  if (isPlainObject(value)) return [here, ...Object.entries(value).flatMap(([k, v]) => pathsOf(v, [...prefix, k]))];
  return [here];
}

// Copies arrays and plain objects (own keys, "__proto__" included); markers and leaves are shared.
function clone(v: unknown): unknown {
  if (Array.isArray(v)) return v.map(clone);
  if (isPlainObject(v)) return objectOf(Object.keys(v).map((k) => [k, clone(v[k])]));
  return v;
}

function applyMutation(root: unknown, m: Mutation): unknown {
  const copy = clone(root);
  if (m.path.length === 0) {
    if (m.op === 'set') return m.value;
    if (m.op === 'wrap') return [copy];
    if (m.op === 'add' && isPlainObject(copy)) return objectOf([...Object.entries(copy), [m.key, m.value]]);
    return copy;
  }
  let parent: unknown = copy;
  for (const step of m.path.slice(0, -1)) {
    parent = (parent as Record<string | number, unknown> | null)?.[step];
    if (typeof parent !== 'object' || parent === null) return copy; // an earlier mutation removed the way
  }
  const last = m.path[m.path.length - 1];
  const container = parent as Record<string | number, unknown>;
  if (typeof container !== 'object' || container === null || !(last in container)) return copy;
  if (m.op === 'set') container[last] = m.value;
  else if (m.op === 'wrap') container[last] = [container[last]];
  else if (m.op === 'delete') {
    if (Array.isArray(container)) container.splice(Number(last), 1);
    else delete container[last];
  } else if (isPlainObject(container[last])) {
    Object.defineProperty(container[last], m.key, { value: m.value, enumerable: true, writable: true, configurable: true });
  }
  return copy;
}

function mutated(sample: object): fc.Arbitrary<unknown> {
  const all = pathsOf(sample);
  const inner = all.filter(([p]) => p.length > 0);
  const objects = all.filter(([, v]) => isPlainObject(v));
  const ops: Array<fc.WeightedArbitrary<Mutation>> = [
    { weight: 6, arbitrary: fc.constantFrom(...all).chain(([p, v]) => likeOf(v).map((value): Mutation => ({ op: 'set', path: p, value }))) },
    { weight: 1, arbitrary: fc.constantFrom(...all).map(([p]): Mutation => ({ op: 'wrap', path: p })) },
  ];
  if (inner.length) ops.push({ weight: 2, arbitrary: fc.constantFrom(...inner).map(([p]): Mutation => ({ op: 'delete', path: p })) });
  if (objects.length)
    ops.push({
      weight: 2,
      arbitrary: fc.tuple(fc.constantFrom(...objects), key, hostile).map(([[p], k, value]): Mutation => ({ op: 'add', path: p, key: k, value })),
    });
  // Mostly one change, so a bad value is not hidden behind another field's message.
  const one = fc.oneof(...ops);
  return fc
    .oneof({ weight: 4, arbitrary: one.map((m) => [m]) }, { weight: 1, arbitrary: fc.array(one, { minLength: 2, maxLength: 3 }) })
    .map((ms) => ms.reduce<unknown>(applyMutation, sample));
}

// CSV files: the header, then rows of hostile cells, quoted or not.
function csvBody(columns: readonly string[], partNumber = 'FZ-300'): fc.Arbitrary<object> {
  const cell = fc.oneof(
    fc.constantFrom(
      '',
      'FZ-301',
      partNumber,
      'A',
      '2',
      '0',
      '-1',
      '1e309',
      '100001',
      'scale',
      'hand',
      '"',
      '""',
      '"unterminated',
      'a,b',
      'line\nbreak',
      '=1+1',
      '\u0000',
      '😀',
    ),
    edgeString,
    longString.map((s) => s.value.slice(0, 300)),
  );
  const quoted = fc.tuple(cell, fc.boolean()).map(([c, q]) => (q ? `"${c.replaceAll('"', '""')}"` : c));
  const row = fc.array(quoted, { minLength: 0, maxLength: columns.length + 2 }).map((cells) => cells.join(','));
  return fc
    .record({
      header: fc.oneof(fc.constant(columns.join(',')), fc.constant(columns.slice().reverse().join(',')), edgeString),
      rows: fc.array(row, { maxLength: 6 }),
      eol: fc.constantFrom('\n', '\r\n', '\r'),
      commit: fc.boolean(),
    })
    .map(({ header, rows, eol, commit }) => ({ csv: [header, ...rows].join(eol), commit }));
}

// ---- requests --------------------------------------------------------------------------------------

type Payload =
  | { kind: 'none' }
  | { kind: 'json'; value: unknown }
  | { kind: 'text'; contentType: string; text: string | Shown<string> }
  | { kind: 'multipart'; boundary: 'ok' | 'missing' | 'mismatched' | 'truncated'; parts: FormPart[] };
interface FormPart {
  name: string;
  filename: string | null; // null: a text field, not a file
  type: string | null;
  bytes: Shown<Buffer>;
}
interface FuzzRequest {
  ids: Record<string, string>; // already URL-encoded path segments
  query: string;
  headers: 'sample' | 'none' | string; // a string: the sample's headers set to this value
  payload: Payload;
}

// Percent-encodes UTF-8 bytes; lone surrogates become U+FFFD as any client would send them.
function encode(text: string): string {
  return [...Buffer.from(text, 'utf8')]
    .map((b) => (/[A-Za-z0-9\-_.~]/.test(String.fromCharCode(b)) ? String.fromCharCode(b) : `%${b.toString(16).toUpperCase().padStart(2, '0')}`))
    .join('');
}
const text = (v: unknown) => (v instanceof Shown ? String(v.value) : String(v));

// Kept under 4 000 characters once encoded: Node refuses a request line over its 16 KiB header limit before the app sees it.
const queryValue = fc.oneof(
  edgeString,
  numericString,
  longString.map((s) => {
    const unit = [...s.value][0] ?? '';
    const fits = Math.floor(4000 / Math.max(encode(unit).length, 1));
    return [...s.value].length > fits ? repeated(unit, fits) : s;
  }),
);
const RAW_QUERY_JUNK = ['&', '&&', '=', '&=', '&a', '%', '%ZZ', '%00', '%ED%A0%80', '%C0%AF', '+', '%2B', ';', 'k[]=1', 'a[b]=c'];
// Not '%2e%2e' or '%2F': Next resolves those to another path, so the request never reaches this handler.
const RAW_IDS = ['%00', '%20', '%ZZ', '%ED%A0%80', '%C3%28', '%F0%9F%98%80', '-'];
const HOSTILE_IDS = [
  '-1',
  '0',
  '-0',
  '1e309',
  '1e9',
  'abc',
  '1.5',
  '0x7fffffff',
  '4294967296',
  '9007199254740993',
  '9'.repeat(400),
  'null',
  'undefined',
  'NaN',
  'Infinity',
  '__proto__',
  'constructor',
  '1;DROP TABLE users',
  "1' OR '1'='1",
  'x'.repeat(5000),
];

function idArb(real: number | undefined): fc.Arbitrary<string> {
  const hostileId = fc.oneof(fc.constantFrom(...HOSTILE_IDS).map(encode), fc.constantFrom(...RAW_IDS));
  if (real === undefined) return hostileId;
  // Mostly the real id: a bad id stops the request before its body is read.
  const spelled = fc.constantFrom(`0${real}`, `${real}.0`, `+${real}`, `${real}e0`, ` ${real}`).map(encode);
  return fc.oneof({ weight: 5, arbitrary: fc.constant(String(real)) }, { weight: 1, arbitrary: spelled }, { weight: 2, arbitrary: hostileId });
}

function queryArb(sample: Record<string, string> | undefined): fc.Arbitrary<string> {
  const base = Object.entries(sample ?? {});
  const pairs = fc.oneof(
    { weight: 1, arbitrary: fc.constant(base) },
    {
      weight: 5,
      arbitrary: fc
        .array(
          fc.oneof(
            fc.tuple(fc.constantFrom(...(base.length ? base.map(([k]) => k) : ['q'])), queryValue).map(([k, v]) => ({ set: k, v })),
            fc.constantFrom(...(base.length ? base.map(([k]) => k) : ['q'])).map((k) => ({ drop: k })),
            fc.tuple(key, queryValue).map(([k, v]) => ({ add: k, v })),
          ),
          { minLength: 1, maxLength: 3 },
        )
        .map((changes) => {
          let list: Array<[string, unknown]> = [...base];
          for (const c of changes) {
            if ('drop' in c) list = list.filter(([k]) => k !== c.drop);
            else if ('set' in c) list = [...list.filter(([k]) => k !== c.set), [c.set, c.v]];
            else list.push([c.add, c.v]);
          }
          return list;
        }),
    },
  );
  return fc.tuple(pairs, fc.option(fc.constantFrom(...RAW_QUERY_JUNK), { freq: 4 })).map(([list, junk]) => queryString(list, junk));
}

function queryString(list: Array<[string, unknown]>, junk: string | null = null): string {
  const parts = list.map(([k, v]) => `${encode(k)}=${encode(text(v))}`);
  if (junk) parts.push(junk);
  return parts.length ? `?${parts.join('&')}` : '';
}

const INVALID_JSON = [
  '{',
  '[',
  '{"a":',
  '{"a":1,}',
  "{'a':1}",
  'NaN',
  'undefined',
  '{"a":1}{"b":2}',
  '"unterminated',
  '\uFEFF{}',
  '\u0000',
  'null',
  'true',
  '0',
  '""',
  '[]',
  ' \t\n ',
  '{"__proto__":{"polluted":1}}',
  '{"constructor":{"prototype":{"polluted":1}}}',
];
const NUMBER_TEXT = ['1e309', '-1e309', '1E400', '1e-400', '-0', '0.000000000000000000000000000001', '123456789012345678901234567890'];
const WRONG_TYPES = [
  'text/plain',
  'application/x-www-form-urlencoded',
  'application/xml',
  'multipart/form-data; boundary=x',
  'application/json; charset=utf-16',
  'application/octet-stream',
];

// Bodies for a handler that reads JSON: mutations of its samples, whole hostile values, broken JSON text, other types.
function jsonPayload(s: Sample): fc.Arbitrary<Payload> {
  const bodies = s.bodies ?? [];
  const anyJson = bodies[0] === undefined ? '{}' : JSON.stringify(bodies[0], (_, v: unknown) => (v instanceof Live ? 0 : v));
  const arbs: Array<fc.WeightedArbitrary<Payload>> = [
    { weight: 2, arbitrary: hostile.map((value): Payload => ({ kind: 'json', value })) },
    {
      weight: 1,
      arbitrary: fc
        .oneof(
          fc.constantFrom(...INVALID_JSON),
          fc.constantFrom(
            new Shown('['.repeat(100_000) + ']'.repeat(100_000), '[ nested 100000 deep'),
            new Shown('{"a":'.repeat(50_000) + '1' + '}'.repeat(50_000), '{ nested 50000 deep'),
            new Shown(' '.repeat(6_000_000) + anyJson, '6 MB of spaces, then a sample'),
          ),
          fc.nat().map((n) => anyJson.slice(0, n % Math.max(anyJson.length, 1))),
          // A number in the sample's text swapped for one JSON.stringify never writes.
          fc.tuple(fc.nat(), fc.constantFrom(...NUMBER_TEXT)).map(([n, num]) => {
            let i = 0;
            const count = (anyJson.match(/-?\d+(\.\d+)?/g) ?? []).length || 1;
            return anyJson.replace(/-?\d+(\.\d+)?/g, (m) => (i++ === n % count ? num : m));
          }),
          fc.constant(anyJson.replace(/^\{"(\w+)":/, '{"$1":"first","$1":')),
        )
        .map((t): Payload => ({ kind: 'text', contentType: 'application/json', text: t })),
    },
    {
      weight: 1,
      arbitrary: fc
        .tuple(fc.constantFrom(...WRONG_TYPES), fc.constantFrom(anyJson, 'a=1&b=2', '<a>1</a>'))
        .map(([contentType, t]): Payload => ({ kind: 'text', contentType, text: t })),
    },
  ];
  if (bodies.length) {
    arbs.push({ weight: 10, arbitrary: fc.oneof(...bodies.map(mutated)).map((value): Payload => ({ kind: 'json', value })) });
    arbs.push({ weight: 1, arbitrary: fc.constantFrom(...bodies).map((value): Payload => ({ kind: 'json', value })) });
  }
  if (s.extra) arbs.push({ weight: 3, arbitrary: s.extra.map((value): Payload => ({ kind: 'json', value })) });
  return fc.oneof(...arbs);
}

const shownBytes = (b: Buffer, label: string) => new Shown(b, label);
function uploadPayload(field: string, s: Sample): fc.Arbitrary<Payload> {
  const file = s.file ?? { name: 'file.bin', type: 'application/octet-stream', bytes: Buffer.from('x') };
  const bytes = fc.oneof(
    { weight: 3, arbitrary: fc.constant(shownBytes(file.bytes, `valid ${file.type}`)) },
    {
      weight: 3,
      arbitrary: fc.constantFrom(
        shownBytes(Buffer.alloc(0), 'empty'),
        shownBytes(PNG.subarray(0, 4), 'PNG magic, cut short'),
        shownBytes(PDF.subarray(0, 4), 'PDF magic, cut short'),
        shownBytes(Buffer.from('ffd8ffe000104a464946', 'hex'), 'JPEG header only'),
        shownBytes(Buffer.from('RIFF\u0000\u0000\u0000\u0000WEBPVP8 '), 'WebP header only'),
        shownBytes(Buffer.from('<html><script>alert(1)</script>'), 'HTML'),
        shownBytes(Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" onload="alert(1)"/>'), 'SVG'),
        shownBytes(Buffer.concat([file.bytes, Buffer.alloc(5 * 1024 * 1024)]), 'valid start, 5 MB over'),
      ),
    },
    { weight: 2, arbitrary: fc.uint8Array({ maxLength: 300 }).map((a) => shownBytes(Buffer.from(a), `random ${a.length} bytes`)) },
  );
  const part = fc.record({
    name: fc.oneof(
      { weight: 5, arbitrary: fc.constant(field) },
      { weight: 1, arbitrary: fc.constantFrom('', 'file', `${field}[]`, field.toUpperCase(), '__proto__') },
    ),
    filename: fc.oneof(
      { weight: 4, arbitrary: fc.constant(file.name) },
      {
        weight: 2,
        arbitrary: fc.constantFrom(
          '../../../etc/passwd',
          `${'a'.repeat(300)}.png`,
          'x.png.exe',
          '.htaccess',
          'photo.svg',
          '',
          '😀.pdf',
          'a"b.png',
          'nul\u0000.png',
          'back\\slash.pdf',
        ),
      },
      { weight: 1, arbitrary: fc.constant(null) },
    ),
    type: fc.oneof(
      { weight: 3, arbitrary: fc.constant(file.type) },
      {
        weight: 2,
        arbitrary: fc.constantFrom(
          'image/png',
          'image/jpeg',
          'image/svg+xml',
          'text/html',
          'application/pdf',
          'application/octet-stream',
          'multipart/mixed',
          ';;;',
        ),
      },
      { weight: 1, arbitrary: fc.constant(null) },
    ),
    bytes,
  });
  return fc.oneof(
    {
      weight: 6,
      arbitrary: fc
        .record({
          boundary: fc.constantFrom<'ok' | 'missing' | 'mismatched' | 'truncated'>('ok', 'ok', 'ok', 'missing', 'mismatched', 'truncated'),
          parts: fc.array(part, { maxLength: 3 }),
        })
        .map((m): Payload => ({ kind: 'multipart', ...m })),
    },
    { weight: 1, arbitrary: hostile.map((value): Payload => ({ kind: 'json', value })) },
    {
      weight: 1,
      arbitrary: fc
        .tuple(
          fc.constantFrom(...WRONG_TYPES, 'multipart/form-data', 'multipart/form-data; boundary='),
          fc.constantFrom('', 'garbage', '--x\r\n\r\n', '{"photo":"x"}'),
        )
        .map(([contentType, t]): Payload => ({ kind: 'text', contentType, text: t })),
    },
  );
}

// Handlers that read neither a body nor an upload still get sent junk: they must ignore it.
const junkPayload: fc.Arbitrary<Payload> = fc.oneof(
  fc.constant<Payload>({ kind: 'none' }),
  hostile.map((value): Payload => ({ kind: 'json', value })),
  fc.constantFrom(...INVALID_JSON).map((t): Payload => ({ kind: 'text', contentType: 'application/json', text: t })),
);

function requestArb(h: Handler, s: Sample, w: World): fc.Arbitrary<FuzzRequest> {
  const ids = Object.fromEntries(h.params.map((p) => [p, idArb(s.ids?.[p] ?? fixtureId(h, p, w))]));
  const payload =
    h.method === 'GET' ? fc.constant<Payload>({ kind: 'none' }) : h.uploadField ? uploadPayload(h.uploadField, s) : h.body ? jsonPayload(s) : junkPayload;
  const headers = s.headers
    ? fc.oneof(
        { weight: 5, arbitrary: fc.constant('sample') },
        { weight: 1, arbitrary: fc.constant('none') },
        {
          weight: 1,
          arbitrary: fc.oneof(
            fc.constantFrom('', 'short', 'k'.repeat(101), '../../x', "' OR 1=1"),
            fc.string({ unit: 'binary-ascii', maxLength: 40 }).map((v) => v.replace(/[^\x20-\x7e]/g, '')),
          ),
        },
      )
    : fc.constant('sample');
  return fc.record({ ids: fc.record(ids), query: h.query ? queryArb(s.query) : fc.constant(''), headers, payload });
}

// Every field of every sample set in turn to values that overflow a column (10^8 g; 100 001 kg in
// grams) or any text column (70 000 characters), run before the random requests as fast-check
// examples: a field without its bound is found whatever the seed.
const SWEEP_TEXT = repeated('x', 70_000);
function sweepValues(original: unknown): unknown[] {
  if (typeof original === 'number' || original instanceof Live) return [1e8, 100_001];
  if (typeof original === 'string' || original instanceof Fresh) return [SWEEP_TEXT];
  return [];
}

function sweep(h: Handler, s: Sample, w: World): FuzzRequest[] {
  const ids = Object.fromEntries(h.params.map((p) => [p, String(s.ids?.[p] ?? fixtureId(h, p, w))]));
  const query = Object.entries(s.query ?? {});
  const base = { ids, query: queryString(query), headers: 'sample' };
  if (h.method === 'GET') {
    // The largest safe integer (an offset of page × pageSize), and text as long as a request line allows.
    const values = ['9007199254740991', '1e8', 'x'.repeat(3000)];
    return query.flatMap(([k]) =>
      values.map((x): FuzzRequest => ({ ...base, query: queryString([...query.filter(([q]) => q !== k), [k, x]]), payload: { kind: 'none' } })),
    );
  }
  if (h.uploadField) return [];
  return (s.bodies ?? []).flatMap((body) =>
    pathsOf(body)
      .filter(([p]) => p.length > 0)
      .flatMap(([p, v]) =>
        sweepValues(v).map((value): FuzzRequest => ({ ...base, payload: { kind: 'json', value: applyMutation(body, { op: 'set', path: p, value }) } })),
      ),
  );
}

// The resource is the path segment before the id ("/parts/[id]" → parts, "/items/[itemId]" → items).
function fixtureId(h: Handler, param: string, w: World): number | undefined {
  const segments = h.route.split('/');
  return w.ids[segments[segments.indexOf(`[${param}]`) - 1]];
}

function multipartBody(p: Extract<Payload, { kind: 'multipart' }>): { contentType: string; body: Buffer } {
  const boundary = `----fuzz${randomUUID()}`;
  const chunks = p.parts.flatMap((part) => [
    Buffer.from(
      `--${boundary}\r\nContent-Disposition: form-data; name="${part.name}"${part.filename === null ? '' : `; filename="${part.filename}"`}\r\n${part.type ? `Content-Type: ${part.type}\r\n` : ''}\r\n`,
    ),
    part.bytes.value,
    Buffer.from('\r\n'),
  ]);
  const body = Buffer.concat([...chunks, Buffer.from(`--${boundary}--\r\n`)]);
  if (p.boundary === 'missing') return { contentType: 'multipart/form-data', body };
  if (p.boundary === 'mismatched') return { contentType: 'multipart/form-data; boundary=not-the-one', body };
  if (p.boundary === 'truncated') return { contentType: `multipart/form-data; boundary=${boundary}`, body: body.subarray(0, Math.floor(body.length / 2)) };
  return { contentType: `multipart/form-data; boundary=${boundary}`, body };
}

function livesIn(v: unknown): Live[] {
  if (v instanceof Live) return [v];
  if (Array.isArray(v)) return v.flatMap(livesIn);
  return isPlainObject(v) ? Object.values(v).flatMap(livesIn) : [];
}

async function jsonText(value: unknown): Promise<string> {
  const versions = new Map<Live, number>();
  for (const live of livesIn(value)) {
    const [row] = await testDb().query<{ version: number }>(`SELECT version FROM \`${live.table}\` WHERE id = ?`, {
      replacements: [live.id],
      type: QueryTypes.SELECT,
    });
    versions.set(live, row.version);
  }
  return JSON.stringify(value, (_, v: unknown) => (v instanceof Live ? versions.get(v) : v)) ?? 'null';
}

async function send(agent: Agent, h: Handler, s: Sample, r: FuzzRequest) {
  const url = h.route.replace(/\[(\w+)\]/g, (_, p: string) => r.ids[p]) + r.query;
  // A new address each time for the sign-in throttle: the fuzzed sign-ins never block each other, or another test's.
  let req = agent[h.method.toLowerCase() as 'get' | 'post' | 'patch' | 'put' | 'delete'](url).set('X-Forwarded-For', `fuzz-${RUN}-${++serial}`);
  if (s.headers && r.headers !== 'none') for (const [k, v] of Object.entries(s.headers())) req = req.set(k, r.headers === 'sample' ? v : r.headers);
  const p = r.payload;
  if (p.kind === 'json') return req.set('Content-Type', 'application/json').send(await jsonText(p.value));
  if (p.kind === 'text') return req.set('Content-Type', p.contentType).send(text(p.text));
  if (p.kind === 'multipart') {
    const { contentType, body } = multipartBody(p);
    return req.set('Content-Type', contentType).send(body);
  }
  return req;
}

// ---- the checks ----------------------------------------------------------------------------------------

// CHECKSUM TABLE reads every row (InnoDB keeps no live checksum), so it is exact, unlike
// information_schema's table_rows estimate; with a few thousand rows it costs milliseconds.
// The scheduler is off in tests (TF_JOBS=0), so nothing writes on every request but one thing: a
// session's idle clock, moved at most once a minute. Session rows are compared without it, so a
// session started or ended on a refusal still shows. The one refusal that writes on purpose is a failed sign-in.
let tables: string[] = [];
const SESSION_ROWS = `SELECT COUNT(*) AS n, SUM(CRC32(CONCAT_WS('|', id, user_id, token_hash, expires_at, IFNULL(ended_at, '-'), IFNULL(end_reason, '-')))) AS s FROM user_sessions`;
async function fingerprint(): Promise<Map<string, string>> {
  const db = testDb();
  const rows = await db.query<{ Table: string; Checksum: number | string | null }>(
    `CHECKSUM TABLE ${tables
      .filter((t) => t !== 'user_sessions')
      .map((t) => `\`${t}\``)
      .join(', ')}`,
    { type: QueryTypes.SELECT },
  );
  const [sessions] = await db.query<{ n: number; s: string | null }>(SESSION_ROWS, { type: QueryTypes.SELECT });
  return new Map([...rows.map((r): [string, string] => [r.Table.split('.').pop()!, String(r.Checksum)]), ['user_sessions', `${sessions.n}:${sessions.s}`]]);
}

function writesAllowed(h: Handler, status: number): string[] {
  // The sign-in throttle counts a wrong password (401): that write is the point of it.
  return h.key === 'POST /api/v1/session' && status === 401 ? ['sign_in_throttles'] : [];
}

// What internals look like: stack frames, source paths, driver codes and SQL.
const LEAK =
  /\n\s+at |node_modules|\.[jt]sx?:\d+|\bER_[A-Z_]{3,}|sqlMessage|sqlState|Sequelize|\bSELECT\b[\s\S]+\bFROM\b|\bINSERT INTO\b|\bUPDATE\b[\s\S]+\bSET\b/i;

function expectErrorShape(res: { status: number; headers: Record<string, string>; body: unknown; text: string }, what: string) {
  expect(res.headers['content-type'], what).toMatch(/^application\/json/);
  const body = res.body as { error?: Record<string, unknown> };
  expect(Object.keys(body), what).toEqual(['error']);
  const { code, message, fields, ...rest } = body.error ?? {};
  expect(rest, what).toEqual({});
  expect(typeof code === 'string' && typeof message === 'string', what).toBe(true);
  if (fields !== undefined)
    expect(
      Object.values(fields as object).every((v) => typeof v === 'string'),
      what,
    ).toBe(true);
  expect(res.text, what).not.toMatch(LEAK);
}

// ---- the run ---------------------------------------------------------------------------------------------

// A stable seed per handler: adding a route does not change what the others are sent.
function seedFor(k: string): number {
  let hash = 2166136261;
  for (const c of k) hash = Math.imul(hash ^ c.charCodeAt(0), 16777619);
  return (SEED + (hash >>> 0)) % 2 ** 31;
}

let world: World;
let savedSettings: Record<string, unknown>;

beforeAll(async () => {
  const db = testDb();
  tables = (
    await db.query<{ name: string }>('SELECT table_name AS name FROM information_schema.tables WHERE table_schema = DATABASE() ORDER BY 1', {
      type: QueryTypes.SELECT,
    })
  ).map((r) => r.name);
  // Site settings are shared by every test file; whatever a valid PATCH here sets is put back after.
  [savedSettings] = await db.query<Record<string, unknown>>('SELECT * FROM site_settings', { type: QueryTypes.SELECT });

  const agents = new Map<Role, Agent>();
  for (const role of ROLES) agents.set(role, (await signedIn(role)).agent);
  const clerk = agents.get('clerk')!;
  const planner = agents.get('planner')!;
  const part = await createPart({ apwG: 0.5, pieceSpread: 0.001 });
  const sparePart = await createPart();
  const bin = await stockPart(part.id, 1000);
  // A fine scale for the counts; a spare one for the routes that lock, recalibrate or reconfigure it.
  const scale = await createScale({ divisionG: 0.01, eG: 0.1, capacityG: 600, repeatabilityG: 0 });
  const spareScale = await createScale();
  const weight = await createTestWeight(100, 'F1');
  const user = await createUser('operator');
  const container = (await clerk.post('/api/v1/containers').send({ name: unique('tote'), kind: 'tote', tare: 120 })).body.container;
  const { kit, order } = await releasedOrder(planner, { quantity: 2 });
  const spareKit = (
    await planner
      .post('/api/v1/kits')
      .send({ code: unique('FZ-KIT').toUpperCase(), revision: 'A', description: 'Fuzz spare kit', components: [{ partId: part.id, quantity: 1 }] })
  ).body.kit;
  const drafts = [];
  for (let i = 0; i < 2; i++) drafts.push((await planner.post('/api/v1/orders').send({ kitId: kit.id, quantity: 3 })).body.order);
  const fullOrder = (await planner.get(`/api/v1/orders/${order.id}`)).body.order;
  const capture = (body: object) =>
    clerk
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send({ partId: part.id, scaleId: scale.id, tare: 0, sample: { quantity: 20, netWeight: 10 }, sampleOnPan: false, stable: true, ...body });
  // A cycle count 10 % under the book is held for a decision; two part counts make a lot to audit.
  const binCount = (await capture({ purpose: 'bin', binId: bin.id, binVersion: bin.version, gross: 450 })).body.binCount;
  for (const gross of [25, 25.5]) expect((await capture({ purpose: 'part', gross })).status).toBe(201);
  const today = utcDay();
  const audit = (
    await agents
      .get('quality')!
      .post('/api/v1/audits')
      .send({ population: { from: utcDay(-1), to: today, partId: part.id }, aql: 2.5 })
  ).body.audit;
  expect(binCount?.status).toBe('pending');
  expect(audit?.items.length).toBeGreaterThan(0);
  const binNow = (await clerk.get(`/api/v1/bins?code=${bin.code}`)).body.bins[0];
  // A sample held for review, for the decision route.
  const heldSample = await PieceWeightSample.create({
    partId: part.id,
    scaleId: scale.id,
    quantity: 10,
    netWeightG: '5.5',
    apwG: '0.55',
    incrementsG: null,
    createdBy: user.id,
    status: 'held',
    holdReason: 'fuzz: far from the history',
  });

  world = {
    agents,
    ids: {
      samples: heldSample.id,
      users: user.id,
      scales: scale.id,
      containers: container.id,
      parts: part.id,
      kits: kit.id,
      orders: order.id,
      audits: audit.id,
      items: audit.items[0].id,
      'bin-counts': binCount.id,
      bins: bin.id,
      'test-weights': weight.id,
    },
    part,
    scale,
    spareScale,
    sparePart,
    bin: binNow,
    container,
    kit,
    spareKit,
    order: fullOrder,
    drafts,
    settingsId: Number(savedSettings.id),
    user,
    weight,
    today,
  };
});

afterAll(async () => {
  if (!savedSettings) return;
  const columns = Object.keys(savedSettings).filter((c) => c !== 'id');
  await testDb().query(`UPDATE site_settings SET ${columns.map((c) => `\`${c}\` = ?`).join(', ')} WHERE id = ?`, {
    replacements: [...columns.map((c) => savedSettings[c]), savedSettings.id],
  });
});

describe('fuzzing every route handler', () => {
  it('reads every exported handler (each is built with route({...}))', () => {
    expect(HANDLERS.filter((h) => !h.builtWithRoute).map((h) => h.key)).toEqual([]);
    expect(HANDLERS.length).toBeGreaterThan(40); // a parser that finds nothing would fuzz nothing
  });

  it('has a sample for every handler it fuzzes, and none for a handler that is gone', () => {
    expect(Object.keys(SAMPLES).sort()).toEqual(FUZZED.map((h) => h.key).sort());
  });

  for (const h of FUZZED) {
    it(`${h.key}: no 5xx, errors in the JSON shape, nothing written on a 4xx`, async () => {
      const sample = (SAMPLES[h.key] ?? (() => ({})))(world);
      for (const p of h.params) expect(sample.ids?.[p] ?? fixtureId(h, p, world), `a fixture id for [${p}] of ${h.route}`).toBeDefined();
      const role = roleFor(h);
      await fc.assert(
        fc.asyncProperty(requestArb(h, sample, world), async (r) => {
          const agent = !role ? anonymous() : sample.ownSession ? (await signedIn(role)).agent : world.agents.get(role)!;
          const before = await fingerprint();
          const res = await send(agent, h, sample, r);
          const what = `${h.key} answered ${res.status}: ${res.text?.slice(0, 300)}`;
          expect(res.status, what).toBeLessThan(500);
          // Signed in with a role the handler lets in: a 401 or 403 means the request never reached it.
          if (role) expect([401, 403], what).not.toContain(res.status);
          if (res.status >= 400) {
            expectErrorShape(res, what);
            const after = await fingerprint();
            const allowed = writesAllowed(h, res.status);
            const written = [...after].filter(([t, sum]) => before.get(t) !== sum && !allowed.includes(t)).map(([t]) => t);
            expect(written, `${what}\nwrote to ${written.join(', ')}`).toEqual([]);
          } else if (res.status === 202 && res.body?.batchId) {
            // Print jobs are sent after the response; let them finish so they do not land in the next fingerprint.
            await waitForBatch(agent, res.body.batchId);
          }
        }),
        { seed: seedFor(h.key), numRuns: RUNS, examples: sweep(h, sample, world).map((r) => [r]) },
      );
    }, 120_000);
  }
});
