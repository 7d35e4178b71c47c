import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { CountEvent } from '../../models';
import { createPart, createScale, testDb } from '../helpers/db';
import { signedIn } from '../helpers/http';

// 25 pieces of about 0.6 g as the sample, left on the pan, then about 75 more added.
function capture(partId: number, scaleId: number, over: Record<string, unknown> = {}) {
  return {
    purpose: 'part',
    partId,
    scaleId,
    unit: 'g',
    gross: 112.3,
    tare: 52.3,
    sample: { quantity: 25, netWeight: 15.0 },
    sampleOnPan: true,
    stable: true,
    ...over,
  };
}

describe('POST /api/v1/counts', () => {
  it('recomputes the count on the server from the weights, ignoring any count the client sends', async () => {
    const { agent, userId } = await signedIn('operator');
    const part = await createPart({ pieceSpread: 0.01 });
    const scale = await createScale();
    const res = await agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send({ ...capture(part.id, scale.id), count: 5000 });
    expect(res.status).toBe(201);
    // net 60.0 g at APW 0.6 g → 100 pieces
    expect(res.body.count).toMatchObject({ count: 100, net: 60, tare: 52.3, averagePieceWeight: 0.6, operatorId: userId, pieceSpread: 0.01 });
    expect(res.body.count.expandedUncertainty).toBeGreaterThan(0);
    expect(res.headers['idempotent-replayed']).toBe('false');
  });

  it('answers a retry with the same key with the same event, and writes it once', async () => {
    const { agent } = await signedIn('clerk');
    const part = await createPart();
    const scale = await createScale();
    const key = randomUUID();
    const first = await agent.post('/api/v1/counts').set('Idempotency-Key', key).send(capture(part.id, scale.id));
    const again = await agent.post('/api/v1/counts').set('Idempotency-Key', key).send(capture(part.id, scale.id));
    expect(first.status).toBe(201);
    expect(again.status).toBe(201);
    expect(again.body).toEqual(first.body);
    expect(again.headers['idempotent-replayed']).toBe('true');
    testDb();
    expect(await CountEvent.count({ where: { idempotencyKey: key } })).toBe(1);
  });

  it('keeps one event when the same capture races in five times at once', async () => {
    const { agent } = await signedIn('operator');
    const part = await createPart();
    const scale = await createScale();
    const key = randomUUID();
    const results = await Promise.all(
      Array.from({ length: 5 }, () => agent.post('/api/v1/counts').set('Idempotency-Key', key).send(capture(part.id, scale.id))),
    );
    expect(results.map((r) => r.status)).toEqual([201, 201, 201, 201, 201]);
    expect(new Set(results.map((r) => r.body.count.id)).size).toBe(1);
    expect(await CountEvent.count({ where: { idempotencyKey: key } })).toBe(1);
  });

  it('refuses a key reused for a different capture with 409', async () => {
    const { agent } = await signedIn('operator');
    const part = await createPart();
    const scale = await createScale();
    const key = randomUUID();
    await agent.post('/api/v1/counts').set('Idempotency-Key', key).send(capture(part.id, scale.id));
    const other = await agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', key)
      .send(capture(part.id, scale.id, { gross: 130 }));
    expect(other.status).toBe(409);
  });

  it('refuses a locked scale with 422 scale_locked and writes nothing', async () => {
    const { agent } = await signedIn('operator');
    const part = await createPart();
    const scale = await createScale({ status: 'locked' });
    const key = randomUUID();
    const res = await agent.post('/api/v1/counts').set('Idempotency-Key', key).send(capture(part.id, scale.id));
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('scale_locked');
    expect(res.body.error.message).toContain(scale.name);
    expect(await CountEvent.count({ where: { idempotencyKey: key } })).toBe(0);
  });

  it('takes a tare within one division below zero as zero, and names the tare when it is further below', async () => {
    const { agent } = await signedIn('operator');
    const part = await createPart({ pieceSpread: 0.01 });
    const scale = await createScale(); // d = 0.1 g
    const drifted = await agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send(capture(part.id, scale.id, { gross: 60, tare: -0.048 }));
    expect(drifted.status).toBe(201);
    expect(drifted.body.count).toMatchObject({ tare: 0, net: 60, count: 100 });
    const far = await agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send(capture(part.id, scale.id, { gross: 60, tare: -0.5 }));
    expect(far.status).toBe(400);
    expect(far.body.error.fields.tare).toMatch(/below zero.*zero the scale/);
  });

  it('says how sure the count is, with ± whole pieces that agree with exact', async () => {
    const { agent } = await signedIn('operator');
    const part = await createPart({ pieceSpread: 0.01 });
    const scale = await createScale({ divisionG: 0.01, eG: 0.1, repeatabilityG: 0.005 });
    const res = await agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send(capture(part.id, scale.id, { gross: 52.3 + 15 + 0.6 * 10 }));
    expect(res.status).toBe(201);
    const c = res.body.count;
    expect(c.count).toBe(35);
    expect(c.probabilityExact).toBeGreaterThan(0);
    expect(c.wholePieceRange === 0).toBe(c.exact);
  });

  it("counts a bulk weighed on a platform from a sample weighed on a fine scale, with both scales' calibration", async () => {
    const { agent } = await signedIn('clerk');
    const part = await createPart({ pieceSpread: 0.005 });
    const fine = await createScale({ divisionG: 0.001, eG: 0.01, capacityG: 600, repeatabilityG: 0.0005 });
    const platform = await createScale({ divisionG: 1, eG: 10, capacityG: 60000, repeatabilityG: 0.5 });
    const body = capture(part.id, fine.id, {
      bulkScaleId: platform.id,
      sampleOnPan: false,
      gross: 6450,
      tare: 450,
      sample: { quantity: 50, netWeight: 30.012 },
    });
    const res = await agent.post('/api/v1/counts').set('Idempotency-Key', randomUUID()).send(body);
    expect(res.status).toBe(201);
    expect(res.body.count).toMatchObject({ scaleId: fine.id, bulkScaleId: platform.id, count: 9996, exact: false });
    const onePlatform = await agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send({ ...body, bulkScaleId: fine.id });
    expect(onePlatform.status).toBe(400);
    expect(onePlatform.body.error.fields.bulkScaleId).toBeTruthy();
    const onPan = await agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send({ ...body, sampleOnPan: true });
    expect(onPan.status).toBe(400);
    expect(onPan.body.error.fields.sampleOnPan).toBeTruthy();
  });

  it.each([
    ['a moving reading', { stable: false }, 422, 'unstable'],
    ['a load above Max', { gross: 6000.5 }, 422, 'over_capacity'],
    ['gross below tare', { gross: 40 }, 400, 'validation_failed'],
    ['a sample heavier than the pan', { sample: { quantity: 25, netWeight: 80 } }, 400, 'validation_failed'],
    ['an unknown part', { partId: 9999999 }, 404, 'not_found'],
    ['a missing sample', { sample: undefined }, 400, 'validation_failed'],
  ])('refuses %s', async (_label, patch, status, code) => {
    const { agent } = await signedIn('operator');
    const part = await createPart();
    const scale = await createScale();
    const key = randomUUID();
    const res = await agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', key)
      .send(capture(part.id, scale.id, patch));
    expect(res.status).toBe(status);
    expect(res.body.error.code).toBe(code);
    expect(await CountEvent.count({ where: { idempotencyKey: key } })).toBe(0);
  });

  it('needs an Idempotency-Key header', async () => {
    const { agent } = await signedIn('operator');
    const part = await createPart();
    const scale = await createScale();
    const res = await agent.post('/api/v1/counts').send(capture(part.id, scale.id));
    expect(res.status).toBe(400);
    expect(res.body.error.fields['Idempotency-Key']).toBeTruthy();
  });

  it('lists counts filtered by part, scale, operator and purpose, newest first', async () => {
    const op = await signedIn('operator');
    const part = await createPart();
    const scale = await createScale();
    await op.agent.post('/api/v1/counts').set('Idempotency-Key', randomUUID()).send(capture(part.id, scale.id));
    await op.agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send(capture(part.id, scale.id, { purpose: 'bin', sampleOnPan: false, gross: 112.3 }));
    const all = await op.agent.get(`/api/v1/counts?partId=${part.id}`);
    expect(all.body.total).toBe(2);
    expect(all.body.counts[0].purpose).toBe('bin');
    const bins = await op.agent.get(`/api/v1/counts?partId=${part.id}&purpose=bin&operatorId=${op.userId}&scaleId=${scale.id}`);
    expect(bins.body.counts.map((c: { purpose: string }) => c.purpose)).toEqual(['bin']);
    const bad = await op.agent.get('/api/v1/counts?from=yesterday');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.from).toBeTruthy();
  });
});
