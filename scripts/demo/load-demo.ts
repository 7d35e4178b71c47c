// Builds the demo through the same services the app uses, so stock, movements and learned
// weights are consistent. Deterministic: a fixed seed makes every sample the same each time.
import { Bin, Part, Scale, TestWeight } from '../../models';
import { defaultTestLoads } from '../../lib/metrology/evaluate-calibration';
import { createRandom } from '../../lib/scale/prng';
import type { SessionUser } from '../../server/auth/session';
import { createAudit } from '../../server/services/audits/create-audit';
import { recordHandCount } from '../../server/services/audits/record-hand-count';
import { createBin } from '../../server/services/bins/create-bin';
import { recordCalibration } from '../../server/services/calibration/record-calibration';
import { createTestWeight } from '../../server/services/calibration/test-weights';
import { createContainer } from '../../server/services/containers/create-container';
import { recordCount } from '../../server/services/counting/record-count';
import { createKit } from '../../server/services/kits/create-kit';
import { createOrder } from '../../server/services/orders/create-order';
import { releaseOrder } from '../../server/services/orders/release-order';
import { createPart } from '../../server/services/parts/create-part';
import { recordSample } from '../../server/services/parts/record-sample';
import { createScale } from '../../server/services/scales/create-scale';
import { DEMO_CONTAINERS, DEMO_HAND_PARTS, DEMO_KITS, DEMO_PARTS, DEMO_SCALES, DEMO_TEST_WEIGHTS } from './demo-catalog';

type People = Record<'admin' | 'planner' | 'operator' | 'clerk' | 'quality', SessionUser>;

const random = createRandom(20261202);
const roundTo = (x: number, step: number) => Math.round(x / step) * step;
// Dates are set from the day the demo is loaded, so it tells the same story whenever it is started.
const daysFromToday = (days: number) => new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);

export async function loadDemo(people: People): Promise<void> {
  const scales = new Map<string, Scale>();
  for (const s of DEMO_SCALES) {
    const connection = s.name.includes('serial')
      ? {
          kind: 'serial' as const,
          baudRate: 9600,
          dataBits: 8 as const,
          parity: 'none' as const,
          stopBits: 1 as const,
          lineFormat: 'signed-unit-flag',
          mode: 'continuous' as const,
          pollIntervalMs: 200,
        }
      : { kind: 'simulator' as const, settleMs: 250, driftPerMinute: 0, rateHz: 20 };
    const dto = await createScale({ input: { ...s, unit: 'g', connection } });
    scales.set(s.name, (await Scale.findByPk(dto.id))!);
  }
  for (const c of DEMO_CONTAINERS) await createContainer({ input: { ...c, unit: 'g' } });
  for (const w of DEMO_TEST_WEIGHTS)
    await createTestWeight({ input: { ...w, unit: 'g', certificateNumber: `CMW-CAL-${w.identifier.slice(7)}`, dueAt: daysFromToday(300) } });
  await calibrateAll(scales, people.quality);

  const parts = new Map<string, Part>();
  for (const p of DEMO_PARTS) {
    const dto = await createPart({ input: { partNumber: p.partNumber, description: p.description, countingMethod: 'scale' } });
    parts.set(p.partNumber, (await Part.findByPk(dto.id))!);
    await createBin({ input: { code: p.bin, partId: dto.id, containerId: null, bookQuantity: p.stock, abcClass: p.abc }, by: people.clerk });
    await demoSamples(
      dto.id,
      p,
      scales.get('Bench 1 · fine')!,
      p.apw < 0.2 ? scales.get('Bench 1 · fine')! : scales.get('Bench 2 · kitting')!,
      people.operator,
    );
  }
  for (const h of DEMO_HAND_PARTS) await createPart({ input: { ...h, countingMethod: 'hand' } });
  await demoHeldSample(parts, scales.get('Bench 1 · fine')!, people.operator);

  const kits = [];
  for (const k of DEMO_KITS) {
    const components = k.lines.map(([pn, quantity, toleranceBelow, toleranceAbove]) => ({
      partId: parts.get(pn)!.id,
      quantity,
      toleranceBelow,
      toleranceAbove,
    }));
    kits.push((await createKit({ input: { code: k.code, revision: k.revision, description: k.description, components }, by: people.planner })).kit);
  }
  const { order: endcaps } = await createOrder({ input: { kitId: kits[0].id, quantity: 40, dueDate: daysFromToday(7) }, by: people.planner });
  const released = await releaseOrder({ orderId: endcaps.id, version: endcaps.version, by: people.planner });
  await createOrder({ input: { kitId: kits[1].id, quantity: 25, dueDate: daysFromToday(14) }, by: people.planner });
  // 100 drive kits need 200 bearings against 120 in stock: left in draft to show the shortage.
  await createOrder({ input: { kitId: kits[1].id, quantity: 100, dueDate: daysFromToday(41) }, by: people.planner });
  await demoCaptures(released.lines, parts, scales.get('Bench 2 · kitting')!, people.operator);
  await demoAudit(parts, scales.get('Bench 2 · kitting')!, people);
  await demoVarianceWaiting(parts, scales.get('Bench 2 · kitting')!, people.clerk);
}

// Builds each weighing-test load from the F1/M1 set, largest weights first.
function weightsFor(load: number, set: TestWeight[]): number[] {
  let left = load;
  const used: number[] = [];
  for (const w of [...set].sort((a, b) => Number(b.nominalG) - Number(a.nominalG))) {
    if (Number(w.nominalG) <= left + 1e-9) {
      used.push(w.id);
      left -= Number(w.nominalG);
    }
  }
  return used;
}

async function calibrateAll(scales: Map<string, Scale>, quality: SessionUser): Promise<void> {
  const set = await TestWeight.findAll();
  for (const scale of scales.values()) {
    const e = Number(scale.verificationIntervalG);
    const fails = scale.name.includes('serial');
    const loads = defaultTestLoads(scale.accuracyClass, e, Number(scale.capacityG)).map((l) => Math.max(1, roundTo(l, 1)));
    const usable = loads.filter(
      (l) => weightsFor(l, set).length && Math.abs(set.filter((w) => weightsFor(l, set).includes(w.id)).reduce((a, w) => a + Number(w.nominalG), 0) - l) < 1e-9,
    );
    const points = usable.map((load, i) => ({
      load,
      indication: load + (fails && i === usable.length - 1 ? 4 * e : i % 2 ? e * 0.5 : 0),
      testWeightIds: weightsFor(load, set),
    }));
    const mid = usable[Math.floor(usable.length / 2)];
    await recordCalibration({
      scaleId: scale.id,
      input: {
        stage: 'in_service',
        performedAt: daysFromToday(-5),
        unit: 'g',
        points,
        // Ten weighings, one a division high: s_r ≈ 0.3 d, a steady scale whose readings settle.
        repeatability: { load: mid, indications: [0, 0, 0, 1, 0, 0, 0, 0, 0, 0].map((k) => mid + k * Number(scale.divisionG)) },
        eccentricity: null,
        zeroOk: true,
        tareOk: true,
        intervalDays: 180,
        notes: fails ? 'Reads high at full load after the platter was swapped.' : 'Routine test.',
      },
      by: quality,
    });
  }
}

// Ten pieces added one at a time on the fine scale (teaches the spread), then a sample of at least
// 25 on the bench that counts the part (sets the APW), enough pieces to clear that scale's Min.
async function demoSamples(partId: number, spec: { apw: number; spread: number }, fine: Scale, bench: Scale, by: SessionUser): Promise<void> {
  const { apw, spread } = spec;
  const d = Number(fine.divisionG);
  const pieces = Array.from({ length: 10 }, () => apw * (1 + spread * random.normal()));
  let shown = 0;
  const increments = pieces.map((_, i) => {
    const reading = roundTo(
      pieces.slice(0, i + 1).reduce((a, b) => a + b, 0),
      d,
    );
    const inc = reading - shown;
    shown = reading;
    return Number(inc.toFixed(6));
  });
  await recordSample({ partId, input: { scaleId: fine.id, unit: 'g', quantity: 10, netWeight: Number(shown.toFixed(6)), increments }, by });
  const n = Math.max(25, Math.ceil((1.2 * Number(bench.minLoadG)) / apw));
  const net = roundTo(
    Array.from({ length: n }, () => apw * (1 + spread * random.normal())).reduce((a, b) => a + b, 0),
    Number(bench.divisionG),
  );
  await recordSample({ partId, input: { scaleId: bench.id, unit: 'g', quantity: n, netWeight: Number(net.toFixed(6)) }, by });
}

// A tray of the next O-ring size up weighed as the 6 × 1: 43 % heavier than its history, so the
// sample is held for a planner or quality engineer and teaches the part nothing meanwhile.
async function demoHeldSample(parts: Map<string, Part>, fine: Scale, by: SessionUser): Promise<void> {
  const n = 30;
  const net = roundTo(n * 0.09, Number(fine.divisionG));
  await recordSample({ partId: parts.get('CMW-ORG-6X1')!.id, input: { scaleId: fine.id, unit: 'g', quantity: n, netWeight: Number(net.toFixed(6)) }, by });
}

// The screws and standoffs of the released end-cap order counted at Bench 2, so the queue and
// progress show work done and work waiting.
async function demoCaptures(
  lines: Array<{ id: number; partId: number; required: number }>,
  parts: Map<string, Part>,
  bench: Scale,
  operator: SessionUser,
): Promise<void> {
  const byPart = new Map([...parts.values()].map((p) => [p.id, p]));
  const counted = ['CMW-SCR-M3X8', 'CMW-STD-M3X12'];
  for (const line of lines.filter((l) => counted.includes(byPart.get(l.partId)!.partNumber))) {
    const part = await Part.findByPk(line.partId);
    const spec = DEMO_PARTS.find((p) => p.partNumber === byPart.get(line.partId)!.partNumber)!;
    const sampleNet = roundTo(20 * spec.apw, Number(bench.divisionG));
    const gross = roundTo(line.required * spec.apw, Number(bench.divisionG)) + 3.8;
    await recordCount({
      idempotencyKey: `demo-capture-line-${line.id}`,
      input: {
        purpose: 'kit_line',
        orderLineId: line.id,
        partId: part!.id,
        scaleId: bench.id,
        containerId: null,
        unit: 'g',
        gross,
        tare: 3.8,
        sample: { quantity: 20, netWeight: sampleNet },
        sampleOnPan: true,
        targetQuantity: line.required,
        stable: true,
        binId: null,
        binVersion: null,
      },
      by: operator,
    });
  }
}

// A morning of bag counts at Bench 2, then a count audit over them that quality has finished:
// each recount is the true number of pieces the simulated bag held, so the accuracy report shows
// how the bench really did, near-misses included.
async function demoAudit(parts: Map<string, Part>, bench: Scale, people: People): Promise<void> {
  // The audit samples the counts made from here on, even if loading runs past midnight UTC.
  const startedOn = daysFromToday(0);
  const d = Number(bench.divisionG);
  const bagTare = DEMO_CONTAINERS[0].tare;
  const truth = new Map<number, number>();
  for (let i = 0; i < 30; i++) {
    const spec = DEMO_PARTS[i % DEMO_PARTS.length];
    const pieces = 40 + Math.floor(random.next() * 160);
    const weigh = (n: number) => Array.from({ length: n }, () => spec.apw * (1 + spec.spread * random.normal())).reduce((a, b) => a + b, 0);
    const sample = weigh(20);
    const rest = weigh(pieces - 20);
    const answer = await recordCount({
      idempotencyKey: `demo-bag-${i + 1}`,
      input: {
        purpose: 'part',
        partId: parts.get(spec.partNumber)!.id,
        scaleId: bench.id,
        containerId: null,
        unit: 'g',
        gross: Number(roundTo(bagTare + sample + rest, d).toFixed(6)),
        tare: bagTare,
        sample: { quantity: 20, netWeight: Number(roundTo(sample, d).toFixed(6)) },
        sampleOnPan: true,
        targetQuantity: null,
        stable: true,
        binId: null,
        binVersion: null,
      },
      by: people.operator,
    });
    truth.set(answer.count.id, pieces);
  }
  const audit = await createAudit({
    input: { population: { from: startedOn, to: daysFromToday(0), purpose: 'part' }, level: 'II', aql: 2.5, seed: 20261202 },
    by: people.quality,
  });
  for (const item of audit.items) await recordHandCount({ auditId: audit.id, itemId: item.id, handCount: truth.get(item.countEventId)!, by: people.quality });
}

// The clerk's recount of the M3 nut bin comes up 130 short, beyond the site limits: it waits on
// the Variances page for a planner or quality engineer, and its notice is in the outbox.
async function demoVarianceWaiting(parts: Map<string, Part>, bench: Scale, clerk: SessionUser): Promise<void> {
  const spec = DEMO_PARTS.find((p) => p.partNumber === 'CMW-NUT-M3')!;
  const bin = (await Bin.findOne({ where: { code: spec.bin } }))!;
  const d = Number(bench.divisionG);
  const weigh = (n: number) =>
    roundTo(
      Array.from({ length: n }, () => spec.apw * (1 + spec.spread * random.normal())).reduce((a, b) => a + b, 0),
      d,
    );
  await recordCount({
    idempotencyKey: 'demo-bin-recount-nuts',
    input: {
      purpose: 'bin',
      partId: parts.get(spec.partNumber)!.id,
      scaleId: bench.id,
      containerId: null,
      unit: 'g',
      gross: Number(weigh(spec.stock - 130).toFixed(6)),
      tare: 0,
      sample: { quantity: 50, netWeight: Number(weigh(50).toFixed(6)) },
      sampleOnPan: false,
      targetQuantity: null,
      stable: true,
      binId: bin.id,
      binVersion: bin.version,
    },
    by: clerk,
  });
}
