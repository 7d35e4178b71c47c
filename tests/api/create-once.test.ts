import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { Bin, BuildOrder, Kit } from '../../models';
import { createPart, testDb, unique } from '../helpers/db';
import { signedIn, type Agent } from '../helpers/http';

// A create sent twice with one Idempotency-Key (a double press, a retry after a lost answer, the two
// at the same moment) makes one record; both answers name it (IETF draft "The Idempotency-Key HTTP
// Header Field", the same header the captures take).
async function kitBody() {
  const part = await createPart();
  return { code: unique('ONCE').toUpperCase(), revision: 'A', description: 'Twice-pressed kit', components: [{ partId: part.id, quantity: 2 }] };
}

async function twice(agent: Agent, path: string, body: object, key: string) {
  return Promise.all([0, 1].map(() => agent.post(path).set('Idempotency-Key', key).send(body)));
}

describe('creates with an Idempotency-Key', () => {
  it('makes one build order from two simultaneous requests with the same key, and a second with another key', async () => {
    const planner = await signedIn('planner');
    const kit = await planner.agent.post('/api/v1/kits').send(await kitBody());
    const body = { kitId: kit.body.kit.id, quantity: 5 };
    const key = randomUUID();
    const answers = await twice(planner.agent, '/api/v1/orders', body, key);
    expect(answers.map((a) => a.status)).toEqual([201, 201]);
    expect(answers[0].body.order.id).toBe(answers[1].body.order.id);
    expect(answers.map((a) => a.headers['idempotent-replayed']).sort()).toEqual(['false', 'true']);
    testDb();
    expect(await BuildOrder.count({ where: { kitId: kit.body.kit.id } })).toBe(1);

    // Sent again later: the same order, nothing new.
    const later = await planner.agent.post('/api/v1/orders').set('Idempotency-Key', key).send(body);
    expect(later.status).toBe(201);
    expect(later.body.order.id).toBe(answers[0].body.order.id);
    expect(later.headers['idempotent-replayed']).toBe('true');

    // The key with other input is a mistake, not a replay.
    const changed = await planner.agent
      .post('/api/v1/orders')
      .set('Idempotency-Key', key)
      .send({ ...body, quantity: 6 });
    expect(changed.status).toBe(409);
    expect(changed.body.error.message).toMatch(/already used for a different request/);

    // A new key is a new order; without a key every request creates (as before).
    expect((await planner.agent.post('/api/v1/orders').set('Idempotency-Key', randomUUID()).send(body)).status).toBe(201);
    expect((await planner.agent.post('/api/v1/orders').send(body)).status).toBe(201);
    expect(await BuildOrder.count({ where: { kitId: kit.body.kit.id } })).toBe(3);
  });

  it('makes one kit and one bin from twin requests, where without the key the twin was refused as a duplicate', async () => {
    const planner = await signedIn('planner');
    const body = await kitBody();
    const kits = await twice(planner.agent, '/api/v1/kits', body, randomUUID());
    expect(kits.map((a) => a.status)).toEqual([201, 201]);
    expect(kits[0].body.kit.id).toBe(kits[1].body.kit.id);
    testDb();
    expect(await Kit.count({ where: { code: body.code } })).toBe(1);

    const clerk = await signedIn('clerk');
    const part = await createPart();
    const code = `Q${String.fromCharCode(65 + Math.floor(Math.random() * 26))}-${String(10 + Math.floor(Math.random() * 89))}-${1 + Math.floor(Math.random() * 9)}-${String(10 + Math.floor(Math.random() * 89))}`;
    const bins = await twice(clerk.agent, '/api/v1/bins', { code, partId: part.id, bookQuantity: 40, abcClass: 'C' }, randomUUID());
    expect(
      bins.map((a) => a.status),
      JSON.stringify(bins.map((b) => b.body)),
    ).toEqual([201, 201]);
    expect(bins[0].body.bin.id).toBe(bins[1].body.bin.id);
    expect(await Bin.count({ where: { code } })).toBe(1);
  });

  it('refuses a key that is not a plain token, naming the header', async () => {
    const planner = await signedIn('planner');
    const res = await planner.agent
      .post('/api/v1/kits')
      .set('Idempotency-Key', 'no spaces allowed')
      .send(await kitBody());
    expect(res.status).toBe(400);
    expect(res.body.error.fields['Idempotency-Key']).toMatch(/letters, digits/);
  });
});
