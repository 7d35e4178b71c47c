import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { Bin, BuildOrderLine, CountEvent, Part, PartStock, StockMovement, StockReservation } from '../../models';
import { createPart, createScale, stockPart, testDb, unique } from '../helpers/db';
import { signedIn, type Agent } from '../helpers/http';
import { waitForMail } from '../helpers/mail';
import { releasedOrder } from '../helpers/orders';
import { decodePdf } from '../helpers/decode-pdf';
import { printedJobs } from '../helpers/printer';

async function makeKit(agent: Agent, parts: Array<{ id: number; quantity: number; below?: number; above?: number }>) {
  const res = await agent.post('/api/v1/kits').send({
    code: unique('KIT'),
    revision: 'A',
    description: 'Actuator end-cap kit',
    components: parts.map((p) => ({ partId: p.id, quantity: p.quantity, toleranceBelow: p.below ?? 0, toleranceAbove: p.above ?? 0 })),
  });
  expect(res.status).toBe(201);
  return res.body.kit;
}

async function makeOrder(agent: Agent, kitId: number, quantity: number) {
  const res = await agent.post('/api/v1/orders').send({ kitId, quantity, dueDate: '2026-12-20' });
  expect(res.status).toBe(201);
  return res.body.order;
}

describe('kits and build orders', () => {
  it('creates a kit, refuses duplicates and unknown parts, and copies it to a new revision', async () => {
    const { agent } = await signedIn('planner');
    const screw = await createPart();
    const kit = await makeKit(agent, [{ id: screw.id, quantity: 8, above: 1 }]);
    expect(kit.components).toEqual([expect.objectContaining({ partId: screw.id, quantity: 8, toleranceBelow: 0, toleranceAbove: 1 })]);
    const dup = await agent.post('/api/v1/kits').send({ code: kit.code, revision: 'a', description: 'x', components: [{ partId: screw.id, quantity: 1 }] });
    expect(dup.status).toBe(409);
    const ghost = await agent
      .post('/api/v1/kits')
      .send({ code: unique('KIT'), revision: 'A', description: 'x', components: [{ partId: 9999999, quantity: 1 }] });
    expect(ghost.status).toBe(400);
    expect(ghost.body.error.fields['components.0.partId']).toBe('no such part');
    const copy = await agent.post(`/api/v1/kits/${kit.id}/revisions`).send({ revision: 'B' });
    expect(copy.status).toBe(201);
    expect(copy.body.kit).toMatchObject({ code: kit.code, revision: 'B' });
    expect(copy.body.kit.components).toHaveLength(1);
  });

  it('releases an order, reserving stock, and mails the kitting team', async () => {
    const planner = await signedIn('planner');
    const operator = await signedIn('operator');
    const screw = await createPart();
    await stockPart(screw.id, 1000);
    const kit = await makeKit(planner.agent, [{ id: screw.id, quantity: 8 }]);
    const order = await makeOrder(planner.agent, kit.id, 50);
    expect(order).toMatchObject({ status: 'draft', number: expect.stringMatching(/^BO-\d{4}-\d{5}$/) });
    expect(order.lines[0]).toMatchObject({ required: 400, verdict: 'open' });
    const availability = await planner.agent.get(`/api/v1/orders/${order.id}/availability`);
    expect(availability.body.lines[0]).toMatchObject({ required: 400, onHand: 1000, available: 1000, shortage: 0 });
    const released = await planner.agent.post(`/api/v1/orders/${order.id}/release`).send({ version: order.version });
    expect(released.status).toBe(200);
    expect(released.body.order.status).toBe('released');
    testDb();
    expect((await PartStock.findByPk(screw.id))!.reserved).toBe(400);
    const [mail] = await waitForMail(operator.email);
    expect(mail.subject).toContain(order.number);
    expect(mail.text).toContain(screw.partNumber);
    const again = await planner.agent.post(`/api/v1/orders/${order.id}/release`).send({ version: released.body.order.version });
    expect(again.status).toBe(422);
  });

  it('refuses a release that would over-reserve, lists the shortage and mails planners; nothing is reserved', async () => {
    const planner = await signedIn('planner');
    const washer = await createPart();
    const nut = await createPart();
    await stockPart(washer.id, 100);
    await stockPart(nut.id, 5000);
    const kit = await makeKit(planner.agent, [
      { id: washer.id, quantity: 4 },
      { id: nut.id, quantity: 4 },
    ]);
    const order = await makeOrder(planner.agent, kit.id, 30);
    const res = await planner.agent.post(`/api/v1/orders/${order.id}/release`).send({ version: order.version });
    expect(res.status).toBe(422);
    expect(res.body.error.message).toContain(`${washer.partNumber} short by 20`);
    testDb();
    expect((await PartStock.findByPk(nut.id))!.reserved).toBe(0);
    expect(await StockReservation.count({ where: { partId: nut.id } })).toBe(0);
    const [mail] = await waitForMail(planner.email);
    expect(mail.subject).toContain(order.number);
    expect(mail.text).toMatch(new RegExp(`${washer.partNumber}.*short by 20`));
  });

  it('never over-reserves when many releases compete for the same stock at once', async () => {
    const planner = await signedIn('planner');
    const spring = await createPart();
    await stockPart(spring.id, 100);
    const kit = await makeKit(planner.agent, [{ id: spring.id, quantity: 10 }]);
    // Eight orders of 2 kits (20 springs each) for 100 springs: exactly five can be released.
    const orders = [];
    for (let i = 0; i < 8; i++) orders.push(await makeOrder(planner.agent, kit.id, 2));
    const results = await Promise.all(orders.map((o) => planner.agent.post(`/api/v1/orders/${o.id}/release`).send({ version: o.version })));
    expect(results.filter((r) => r.status === 200)).toHaveLength(5);
    expect(results.filter((r) => r.status === 422)).toHaveLength(3);
    testDb();
    const stock = await PartStock.findByPk(spring.id);
    expect(stock!.reserved).toBe(100);
    expect(await StockReservation.sum('quantity', { where: { partId: spring.id, status: 'active' } })).toBe(100);
  });

  it(
    'answers 16 parallel releases sharing parts with 200 (or 503 to try again), never 500, and reserves exactly what the 200s hold',
    { timeout: 60_000 },
    async () => {
      const planner = await signedIn('planner');
      // Three parts in every kit, listed in different orders, so the releases meet on the same rows from different sides.
      const [a, b, c] = [await createPart(), await createPart(), await createPart()];
      for (const part of [a, b, c]) await stockPart(part.id, 100_000);
      const kits = [
        await makeKit(planner.agent, [
          { id: a.id, quantity: 1 },
          { id: b.id, quantity: 1 },
          { id: c.id, quantity: 1 },
        ]),
        await makeKit(planner.agent, [
          { id: c.id, quantity: 1 },
          { id: a.id, quantity: 1 },
          { id: b.id, quantity: 1 },
        ]),
      ];
      const orders = [];
      for (let i = 0; i < 16; i++) orders.push(await makeOrder(planner.agent, kits[i % 2].id, 3));
      const results = await Promise.all(orders.map((o) => planner.agent.post(`/api/v1/orders/${o.id}/release`).send({ version: o.version })));
      const statuses = results.map((r) => r.status);
      expect(
        statuses.every((s) => s === 200 || s === 503),
        statuses.join(','),
      ).toBe(true);
      for (const r of results.filter((x) => x.status === 503)) expect(Number(r.headers['retry-after'])).toBeGreaterThan(0);
      const released = statuses.filter((s) => s === 200).length;
      testDb();
      for (const part of [a, b, c]) expect((await PartStock.findByPk(part.id))!.reserved).toBe(3 * released);
    },
  );

  it('fills a line from bench captures, shows it in the queue, completes, and books the consumption', async () => {
    const planner = await signedIn('planner');
    const operator = await signedIn('operator');
    const pin = await createPart({ pieceSpread: 0.001 });
    const bin = await stockPart(pin.id, 500);
    const scale = await createScale({ divisionG: 0.01, eG: 0.1, capacityG: 600, repeatabilityG: 0 });
    const kit = await makeKit(planner.agent, [{ id: pin.id, quantity: 10, above: 1 }]);
    const order = await makeOrder(planner.agent, kit.id, 10);
    const released = (await planner.agent.post(`/api/v1/orders/${order.id}/release`).send({ version: order.version })).body.order;
    const lineId = released.lines[0].id;
    const queue = await operator.agent.get('/api/v1/kitting-queue');
    expect(queue.body.lines.find((l: { orderLineId: number }) => l.orderLineId === lineId)).toMatchObject({
      required: 100,
      remaining: 100,
      orderNumber: order.number,
    });

    // 100 pins of 0.25 g: sample of 20 on the pan, whole pan 25.00 g.
    const capture = await operator.agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send({
        purpose: 'kit_line',
        orderLineId: lineId,
        partId: pin.id,
        scaleId: scale.id,
        gross: 25,
        tare: 0,
        sample: { quantity: 20, netWeight: 5 },
        sampleOnPan: true,
        targetQuantity: 100,
        stable: true,
      });
    expect(capture.status).toBe(201);
    expect(capture.body.line).toMatchObject({ id: lineId, counted: 100, verdict: 'in' });
    const inProgress = (await planner.agent.get(`/api/v1/orders/${order.id}`)).body.order;
    expect(inProgress).toMatchObject({ status: 'in_progress', progress: { linesDone: 1, lines: 1 } });
    const queueAfter = await operator.agent.get('/api/v1/kitting-queue');
    expect(queueAfter.body.lines.some((l: { orderLineId: number }) => l.orderLineId === lineId)).toBe(false);
    // A second whole count of a line counted in full is refused and records nothing: it would double the line.
    const again = await operator.agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send({
        purpose: 'kit_line',
        orderLineId: lineId,
        partId: pin.id,
        scaleId: scale.id,
        gross: 25,
        tare: 0,
        sample: { quantity: 20, netWeight: 5 },
        sampleOnPan: true,
        targetQuantity: 100,
        stable: true,
      });
    expect(again.status).toBe(422);
    expect(again.body.error.message).toContain('already counted in full (100 of 100)');
    testDb();
    expect(await CountEvent.count({ where: { orderLineId: lineId } })).toBe(1);
    expect((await BuildOrderLine.findByPk(lineId))!.counted).toBe(100);

    const done = await planner.agent.post(`/api/v1/orders/${order.id}/complete`).send({ version: inProgress.version });
    expect(done.status).toBe(200);
    expect(done.body.order.status).toBe('complete');
    // The kit label went to the printer by itself on completion; its GS1 DataMatrix names the order.
    expect(done.body.order.kitLabel).toMatchObject({ status: 'sent' });
    const symbols = (await decodePdf(printedJobs().at(-1)!.pdf)).flat();
    expect(symbols.some((sym) => sym.text.includes(order.number))).toBe(true);
    testDb();
    const stock = await PartStock.findByPk(pin.id);
    expect(stock).toMatchObject({ onHand: 400, reserved: 0 });
    expect((await Bin.findByPk(bin.id))!.bookQuantity).toBe(400);
    expect(await StockMovement.sum('delta', { where: { partId: pin.id, reason: 'consumption' } })).toBe(-100);
  });

  it('needs a reason to complete with lines out of tolerance, and cancelling gives the stock back', async () => {
    const planner = await signedIn('planner');
    const clip = await createPart();
    await stockPart(clip.id, 300);
    const kit = await makeKit(planner.agent, [{ id: clip.id, quantity: 3 }]);
    const order = await makeOrder(planner.agent, kit.id, 10);
    const released = (await planner.agent.post(`/api/v1/orders/${order.id}/release`).send({ version: order.version })).body.order;
    const noReason = await planner.agent.post(`/api/v1/orders/${order.id}/complete`).send({ version: released.version });
    expect(noReason.status).toBe(422);
    expect(noReason.body.error.fields.overrideReason).toBeTruthy();
    const cancelled = await planner.agent.post(`/api/v1/orders/${order.id}/cancel`).send({ version: released.version });
    expect(cancelled.body.order.status).toBe('cancelled');
    testDb();
    expect((await PartStock.findByPk(clip.id))!.reserved).toBe(0);

    const second = await makeOrder(planner.agent, kit.id, 10);
    const rel2 = (await planner.agent.post(`/api/v1/orders/${second.id}/release`).send({ version: second.version })).body.order;
    const overridden = await planner.agent
      .post(`/api/v1/orders/${second.id}/complete`)
      .send({ version: rel2.version, overrideReason: 'Kits were hand counted at the line after a scale fault' });
    expect(overridden.status).toBe(200);
    expect(overridden.body.order.overrideReason).toMatch(/hand counted/);
    expect(await PartStock.findByPk(clip.id)).toMatchObject({ reserved: 0, onHand: 300 });
  });

  it('rejects bad order input with field messages', async () => {
    const { agent } = await signedIn('planner');
    const res = await agent.post('/api/v1/orders').send({ kitId: 'x', quantity: 0, dueDate: '31/12/2026' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['dueDate', 'kitId', 'quantity']);
  });
});

describe('sending a kit line back for a recount', () => {
  it('lets a planner send an out-of-tolerance line back to the queue; only new captures count for it, the old stay on record', async () => {
    const planner = await signedIn('planner');
    const operator = await signedIn('operator');
    const { order } = await releasedOrder(planner.agent, { quantity: 1 });
    const line = order.lines[0];
    const scale = await createScale({ divisionG: 0.01, eG: 0.1, capacityG: 600, repeatabilityG: 0 });
    testDb();
    await Part.update({ pieceSpread: '0.001', spreadScatter: 1e-6, spreadNoise: 0, spreadDof: 99, spreadObservations: 100 }, { where: { id: line.partId } });
    // 0.5 g pieces: 10 on the pan for a line of 4 (−0/+0) is out of tolerance.
    const capture = (pieces: number) =>
      operator.agent
        .post('/api/v1/counts')
        .set('Idempotency-Key', randomUUID())
        .send({
          purpose: 'kit_line',
          orderLineId: line.id,
          partId: line.partId,
          scaleId: scale.id,
          gross: pieces * 0.5,
          tare: 0,
          sample: { quantity: 2, netWeight: 1 },
          sampleOnPan: true,
          targetQuantity: 4,
          stable: true,
        });
    expect((await capture(10)).body.line).toMatchObject({ counted: 10, verdict: 'out' });
    const now = (await planner.agent.get(`/api/v1/orders/${order.id}`)).body.order;

    expect((await operator.agent.post(`/api/v1/orders/${order.id}/lines/${line.id}/recount`).send({ version: now.version })).status).toBe(403);
    const sent = await planner.agent.post(`/api/v1/orders/${order.id}/lines/${line.id}/recount`).send({ version: now.version });
    expect(sent.status).toBe(200);
    expect(sent.body.order.lines[0]).toMatchObject({ counted: 0, captures: 0, verdict: 'open' });
    expect(sent.body.order.version).toBeGreaterThan(now.version);
    const queue = await operator.agent.get('/api/v1/kitting-queue');
    expect(queue.body.lines.map((l: { orderLineId: number }) => l.orderLineId)).toContain(line.id);

    expect((await capture(4)).body.line).toMatchObject({ counted: 4, verdict: 'in' });
    testDb();
    expect(await CountEvent.count({ where: { orderLineId: line.id } })).toBe(2);
    const again = await planner.agent.post(`/api/v1/orders/${order.id}/lines/${line.id}/recount`).send({ version: sent.body.order.version });
    expect(again.status).toBe(422);
    expect(again.body.error.message).toMatch(/in tolerance/);
  });
});
