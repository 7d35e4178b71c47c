import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { Bin, BuildOrder, CountEvent, PartStock, StockMovement, StockReservation } from '../../models';
import { startAnotherApp } from '../helpers/app-process';
import { crashDatabase, holdRowLocks, startDatabase, waitForLockWaits, waitForNoOpenTransactions } from '../helpers/database-faults';
import { createPart, createScale, stockPart, testDb } from '../helpers/db';
import { anonymous, signedIn, type Agent } from '../helpers/http';
import { releasedOrder } from '../helpers/orders';

// 25 pieces of 0.6 g as the sample, left on the pan, then 75 more: one plain capture of 100.
const looseCapture = (partId: number, scaleId: number) => ({
  purpose: 'part',
  partId,
  scaleId,
  gross: 112.3,
  tare: 52.3,
  sample: { quantity: 25, netWeight: 15 },
  sampleOnPan: true,
  stable: true,
});
// A bin recount of 0.5 g parts weighed apart from a 20-piece sample.
const binCapture = (bin: Bin, scaleId: number, pieces: number) => ({
  purpose: 'bin',
  binId: bin.id,
  binVersion: bin.version,
  partId: bin.partId,
  scaleId,
  gross: pieces * 0.5,
  tare: 0,
  sample: { quantity: 20, netWeight: 10 },
  sampleOnPan: false,
  stable: true,
});

const capture = (agent: Agent, key: string, body: object) => agent.post('/api/v1/counts').set('Idempotency-Key', key).send(body);

async function stockOf(partId: number): Promise<{ onHand: number; reserved: number }> {
  testDb();
  const row = await PartStock.findByPk(partId);
  return { onHand: row?.onHand ?? 0, reserved: row?.reserved ?? 0 };
}

async function reservationsFor(orderId: number): Promise<number> {
  const [rows] = await testDb().query(
    'SELECT COUNT(*) AS n FROM stock_reservations r JOIN build_order_lines l ON l.id = r.order_line_id WHERE l.order_id = ?',
    { replacements: [orderId] },
  );
  return Number((rows as { n: number }[])[0].n);
}

// A failure while the database is away is the documented 503, never a 500 with internals in it.
function expectUnavailable(res: { status: number; body: unknown; text: string; headers: Record<string, string> }) {
  expect(res.status).toBe(503);
  expect(res.body).toMatchObject({ error: { code: 'unavailable' } });
  expect(res.headers['retry-after']).toBe('5');
  expect(res.text).not.toMatch(/SELECT|INSERT|UPDATE|\bat \w+ \(|ECONN|socket/i);
}

describe('faults: the database crashes, the app is killed', () => {
  it(
    'answers captures and a release caught by a database crash with a clear 503, keeps nothing half-written, and serves again once it is back, without a restart',
    { timeout: 120_000 },
    async () => {
      const planner = await signedIn('planner');
      const clerk = await signedIn('clerk');
      const operator = await signedIn('operator');
      const scale = await createScale();
      const { order } = await releasedOrder(planner.agent, { status: 'draft' });
      const orderPart = order.lines[0].partId as number;
      const required = order.lines[0].required as number;
      const binPart = await createPart();
      const bin = await stockPart(binPart.id, 101);
      const loosePart = await createPart();
      const before = { order: await stockOf(orderPart), bin: await stockOf(binPart.id) };

      // Captures that committed before the crash.
      const committedKeys = [randomUUID(), randomUUID(), randomUUID()];
      for (const key of committedKeys) expect((await capture(operator.agent, key, looseCapture(loosePart.id, scale.id))).status).toBe(201);

      // The release and a bin recount (whose variance books stock) wait halfway in, on stock rows held here.
      const locks = await holdRowLocks([{ sql: 'SELECT * FROM part_stock WHERE part_id IN (?, ?)', values: [orderPart, binPart.id] }]);
      const release = planner.agent
        .post(`/api/v1/orders/${order.id}/release`)
        .send({ version: order.version })
        .then((r) => r);
      const binKey = randomUUID();
      const recount = capture(clerk.agent, binKey, binCapture(bin, scale.id, 100)).then((r) => r);
      await waitForLockWaits(2);
      // More captures race the crash: each commits whole or fails whole.
      const racingKeys = Array.from({ length: 8 }, () => randomUUID());
      const racing = racingKeys.map((key) => capture(operator.agent, key, looseCapture(loosePart.id, scale.id)).then((r) => r));
      await crashDatabase();

      const [releaseRes, recountRes, ...racingRes] = await Promise.all([release, recount, ...racing]);
      await locks.release();
      expectUnavailable(releaseRes);
      expectUnavailable(recountRes);
      for (const res of racingRes) {
        expect([201, 503]).toContain(res.status);
        if (res.status === 503) expectUnavailable(res);
      }
      // While it is down: a clear answer, quickly, and the health route says which part is missing.
      expectUnavailable(await capture(operator.agent, randomUUID(), looseCapture(loosePart.id, scale.id)));
      const down = await anonymous().get('/api/v1/health');
      expect(down.status).toBe(503);
      expect(down.body).toEqual({ app: 'ok', database: 'unreachable' });
      // Liveness does not ask the database: the process is alive, so it must not be restarted for this.
      const live = await anonymous().get('/api/v1/health/live');
      expect([live.status, live.body]).toEqual([200, { app: 'ok' }]);
      // Pages too, once the app's server has seen it gone (it asks every 2 s): its own 503 page, not a 500.
      await expect.poll(async () => (await planner.agent.get('/orders')).status, { timeout: 10_000, interval: 250 }).toBe(503);
      const page = await planner.agent.get('/orders');
      expect(page.headers['retry-after']).toBe('10');
      expect(page.headers['content-type']).toMatch(/^text\/html/);
      expect(page.text).toMatch(/The database cannot be reached/);

      await startDatabase();
      await expect.poll(async () => (await anonymous().get('/api/v1/health')).status, { timeout: 30_000, interval: 200 }).toBe(200);
      await expect.poll(async () => (await planner.agent.get('/orders')).status, { timeout: 10_000, interval: 250 }).toBe(200);

      // Nothing half-written: the release reserved nothing, the recount booked nothing.
      testDb();
      expect(await BuildOrder.findByPk(order.id)).toMatchObject({ status: 'draft', version: order.version });
      expect(await reservationsFor(order.id)).toBe(0);
      expect(await stockOf(orderPart)).toEqual(before.order);
      expect(await CountEvent.count({ where: { idempotencyKey: binKey } })).toBe(0);
      expect(await Bin.findByPk(bin.id)).toMatchObject({ bookQuantity: 101, version: bin.version });
      expect(await StockMovement.count({ where: { binId: bin.id } })).toBe(0);
      expect(await stockOf(binPart.id)).toEqual(before.bin);
      for (const key of committedKeys) expect(await CountEvent.count({ where: { idempotencyKey: key } })).toBe(1);
      for (const [i, key] of racingKeys.entries()) {
        // A 503 may still have committed (the crash came between the commit and its answer): at most one.
        const events = await CountEvent.count({ where: { idempotencyKey: key } });
        if (racingRes[i].status === 201) expect(events).toBe(1);
        else expect(events).toBeLessThanOrEqual(1);
      }

      // Retries with the same keys are safe: every capture ends up recorded exactly once.
      for (const key of racingKeys) expect((await capture(operator.agent, key, looseCapture(loosePart.id, scale.id))).status).toBe(201);
      for (const key of racingKeys) expect(await CountEvent.count({ where: { idempotencyKey: key } })).toBe(1);
      const recountAgain = await capture(clerk.agent, binKey, binCapture(bin, scale.id, 100));
      expect(recountAgain.status).toBe(201);
      expect(await Bin.findByPk(bin.id)).toMatchObject({ bookQuantity: 100 });
      expect(await stockOf(binPart.id)).toEqual({ onHand: before.bin.onHand - 1, reserved: before.bin.reserved });
      const releaseAgain = await planner.agent.post(`/api/v1/orders/${order.id}/release`).send({ version: order.version });
      expect(releaseAgain.status).toBe(200);
      expect(await stockOf(orderPart)).toEqual({ onHand: before.order.onHand, reserved: before.order.reserved + required });
      expect(await StockReservation.sum('quantity', { where: { partId: orderPart, status: 'active' } })).toBe(before.order.reserved + required);
    },
  );

  it('leaves the database as it was when the app is killed halfway through a release, and a restarted app releases it once', { timeout: 120_000 }, async () => {
    const first = await startAnotherApp();
    let restarted: Awaited<ReturnType<typeof startAnotherApp>> | undefined;
    try {
      const planner = await signedIn('planner', first.url);
      const { order } = await releasedOrder(planner.agent, { status: 'draft' });
      const partId = order.lines[0].partId as number;
      const before = await stockOf(partId);

      const locks = await holdRowLocks([{ sql: 'SELECT * FROM part_stock WHERE part_id = ?', values: [partId] }]);
      const release = planner.agent
        .post(`/api/v1/orders/${order.id}/release`)
        .send({ version: order.version })
        .then(
          (r) => r,
          (err: Error) => err,
        );
      await waitForLockWaits(1);
      first.child.kill('SIGKILL');
      expect(await release).toBeInstanceOf(Error);
      await locks.release();
      // The server rolls back the dead client's transaction once its statement can finish.
      await waitForNoOpenTransactions();
      testDb();
      expect(await BuildOrder.findByPk(order.id)).toMatchObject({ status: 'draft', version: order.version });
      expect(await reservationsFor(order.id)).toBe(0);
      expect(await stockOf(partId)).toEqual(before);

      restarted = await startAnotherApp();
      const again = await signedIn('planner', restarted.url);
      expect((await again.agent.post(`/api/v1/orders/${order.id}/release`).send({ version: order.version })).status).toBe(200);
      expect(await stockOf(partId)).toEqual({ onHand: before.onHand, reserved: before.reserved + order.lines[0].required });
      expect(await reservationsFor(order.id)).toBe(order.lines.length);
    } finally {
      first.child.kill('SIGKILL');
      restarted?.child.kill('SIGTERM');
    }
  });
});
