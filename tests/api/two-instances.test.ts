import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CountEvent, PartStock, Scale } from '../../models';
import { startAnotherApp } from '../helpers/app-process';
import { createPart, createScale, createUser, stockPart, TEST_PASSWORD, testDb, unique } from '../helpers/db';
import { baseUrl, type Agent } from '../helpers/http';
import { mailTo, waitForMail } from '../helpers/mail';
import type { Role } from '../../lib/roles';

// Behind a load balancer any request may land on any instance: one sign-in must serve both.
async function signedInOnBoth(role: Role, urls: [string, string]): Promise<{ a: Agent; b: Agent; email: string }> {
  const user = await createUser(role);
  const a = request.agent(urls[0]);
  const res = await a.post('/api/v1/session').send({ email: user.email, password: TEST_PASSWORD });
  expect(res.status).toBe(200);
  const cookie = res.headers['set-cookie'] as unknown as string[];
  const b = request.agent(urls[1]);
  b.jar.setCookies(
    cookie.map((c) => c.split(';')[0]),
    '127.0.0.1',
    '/',
  );
  return { a, b, email: user.email };
}

describe('two app instances on one database', () => {
  let second: Awaited<ReturnType<typeof startAnotherApp>>;
  let urls: [string, string];
  beforeAll(async () => {
    second = await startAnotherApp();
    urls = [baseUrl(), second.url];
  }, 60_000);
  afterAll(() => {
    second?.child.kill('SIGTERM');
  });

  it('takes a session from one instance on the other, releases on one and counts on both, with one event per capture', async () => {
    const planner = await signedInOnBoth('planner', urls);
    const operator = await signedInOnBoth('operator', urls);
    expect((await planner.b.get('/api/v1/session')).body.user.role).toBe('planner');

    const pin = await createPart({ pieceSpread: 0.001 });
    await stockPart(pin.id, 500);
    const scale = await createScale({ divisionG: 0.01, eG: 0.1, capacityG: 600, repeatabilityG: 0 });
    const kit = await planner.a
      .post('/api/v1/kits')
      .send({ code: unique('KIT'), revision: 'A', description: 'Spindle kit', components: [{ partId: pin.id, quantity: 10 }] });
    expect(kit.status).toBe(201);
    const order = (await planner.a.post('/api/v1/orders').send({ kitId: kit.body.kit.id, quantity: 10 })).body.order;
    const released = await planner.b.post(`/api/v1/orders/${order.id}/release`).send({ version: order.version });
    expect(released.status).toBe(200);
    const lineId = released.body.order.lines[0].id;

    // 100 pins of 0.25 g, sample of 20 on the pan; the same capture reaches both instances.
    const body = {
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
    };
    const key = randomUUID();
    const [onA, onB] = await Promise.all([
      operator.a.post('/api/v1/counts').set('Idempotency-Key', key).send(body),
      operator.b.post('/api/v1/counts').set('Idempotency-Key', key).send(body),
    ]);
    expect([onA.status, onB.status]).toEqual([201, 201]);
    expect(onA.body.count.id).toBe(onB.body.count.id);
    expect([onA.headers['idempotent-replayed'], onB.headers['idempotent-replayed']].sort()).toEqual(['false', 'true']);
    testDb();
    expect(await CountEvent.count({ where: { idempotencyKey: key } })).toBe(1);
    const progress = (await planner.a.get(`/api/v1/orders/${order.id}`)).body.order;
    expect(progress).toMatchObject({ status: 'in_progress', progress: { linesDone: 1, lines: 1 } });
    expect(progress.lines[0]).toMatchObject({ counted: 100, verdict: 'in' });
  });

  it('never over-reserves when two instances release orders competing for the same stock', async () => {
    const planner = await signedInOnBoth('planner', urls);
    const washer = await createPart();
    await stockPart(washer.id, 60);
    const kit = (
      await planner.a
        .post('/api/v1/kits')
        .send({ code: unique('KIT'), revision: 'A', description: 'Washer kit', components: [{ partId: washer.id, quantity: 4 }] })
    ).body.kit;
    // Each order needs 48 of the 60 on hand: only one of them can be released.
    const orders = await Promise.all([1, 2].map(async () => (await planner.a.post('/api/v1/orders').send({ kitId: kit.id, quantity: 12 })).body.order));
    const results = await Promise.all(
      [planner.a, planner.b].map((agent, i) => agent.post(`/api/v1/orders/${orders[i].id}/release`).send({ version: orders[i].version })),
    );
    expect(results.map((r) => r.status).sort()).toEqual([200, 422]);
    testDb();
    expect(await PartStock.findByPk(washer.id)).toMatchObject({ onHand: 60, reserved: 48 });
  });

  it('sends a calibration reminder once when the job runs on both instances at the same time', async () => {
    const quality = await signedInOnBoth('quality', urls);
    const scale = await createScale();
    const soon = new Date(Date.now() + 3 * 86_400_000).toISOString().slice(0, 10);
    testDb();
    await Scale.update({ calibrationDueAt: soon }, { where: { id: scale.id } });
    const runs = await Promise.all([quality.a, quality.b, quality.a, quality.b].map((agent) => agent.post('/api/v1/jobs/calibration-reminders')));
    expect(runs.map((r) => r.status)).toEqual([200, 200, 200, 200]);
    await waitForMail(quality.email);
    // Give a second, wrongly sent mail time to arrive before counting.
    await new Promise((r) => setTimeout(r, 500));
    expect(mailTo(quality.email).filter((m) => m.subject.includes(scale.name))).toHaveLength(1);
  });
});
