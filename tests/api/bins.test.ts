import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { Bin, PartStock, StockMovement } from '../../models';
import { createPart, createScale, testDb } from '../helpers/db';
import { signedIn, type Agent } from '../helpers/http';
import { mailTo, waitForMail } from '../helpers/mail';

// A random free code in zone BZ; a code another test already took (409) is drawn again.
async function newBin(agent: Agent, partId: number, bookQuantity: number, abcClass = 'A') {
  const two = () => String(1 + Math.floor(Math.random() * 99)).padStart(2, '0');
  let res;
  for (let attempt = 0; attempt < 5; attempt += 1) {
    const code = `bz-${two()}-${1 + Math.floor(Math.random() * 9)}-${two()}`;
    res = await agent.post('/api/v1/bins').send({ code, partId, bookQuantity, abcClass });
    if (res.status !== 409) break;
  }
  expect(res!.status).toBe(201);
  return res!.body.bin;
}

// A bin count: the bulk weighed apart from a 20-piece sample of 0.5 g parts (10 g).
function binCapture(partId: number, scaleId: number, bin: { id: number; version: number }, pieces: number) {
  return {
    purpose: 'bin',
    binId: bin.id,
    binVersion: bin.version,
    partId,
    scaleId,
    gross: pieces * 0.5,
    tare: 0,
    sample: { quantity: 20, netWeight: 10 },
    sampleOnPan: false,
    stable: true,
  };
}

describe('bins and cycle counts', () => {
  it('creates bins with our code scheme and finds one by code (label contract)', async () => {
    const { agent } = await signedIn('clerk');
    const part = await createPart();
    const bin = await newBin(agent, part.id, 200);
    expect(bin.code).toMatch(/^BZ-\d{2}-\d-\d{2}$/);
    const found = await agent.get(`/api/v1/bins?code=${bin.code.toLowerCase()}`);
    expect(found.body.bins).toEqual([expect.objectContaining({ id: bin.id, code: bin.code, partId: part.id, bookQuantity: 200 })]);
    const bad = await agent.post('/api/v1/bins').send({ code: 'shelf 4', partId: part.id, bookQuantity: 1 });
    expect(bad.body.error.fields.code).toMatch(/ZONE-RACK-SHELF-SLOT/);
    testDb();
    expect((await PartStock.findByPk(part.id))!.onHand).toBe(200);
  });

  it('books a small variance at once and holds a large one for approval by quality or a planner', async () => {
    const clerk = await signedIn('clerk');
    const quality = await signedIn('quality');
    const part = await createPart({ pieceSpread: 0.001 });
    const scale = await createScale({ divisionG: 0.01, eG: 0.1, capacityG: 600, repeatabilityG: 0 });
    const bin = await newBin(clerk.agent, part.id, 1000);
    // 997 counted: 3 pieces, 0.3 % — within the default limits (5 pcs and 2 %).
    const small = await clerk.agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send(binCapture(part.id, scale.id, bin, 997));
    expect(small.status).toBe(201);
    expect(small.body.binCount).toMatchObject({ bookQuantity: 1000, counted: 997, variance: -3, status: 'applied' });
    testDb();
    const afterSmall = await Bin.findByPk(bin.id);
    expect(afterSmall!.bookQuantity).toBe(997);

    // 900 counted: 97 pieces, 9.7 % — beyond both limits: pending, book unchanged.
    const large = await clerk.agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send(binCapture(part.id, scale.id, { id: bin.id, version: afterSmall!.version }, 900));
    expect(large.body.binCount).toMatchObject({ variance: -97, status: 'pending' });
    expect((await Bin.findByPk(bin.id))!.bookQuantity).toBe(997);
    const pending = await quality.agent.get(`/api/v1/bin-counts?status=pending&binId=${bin.id}`);
    expect(pending.body.binCounts).toHaveLength(1);
    // The approvers hear of it at once, with the numbers they decide on; the small one mailed nobody.
    const [notice] = await waitForMail(quality.email);
    expect(notice.subject).toBe(`Variance to decide: bin ${bin.code} counted 900, book 997 (-97 pcs, 9.7 %)`);
    expect(notice.text).toContain(`${part.partNumber}`);
    expect(mailTo(quality.email)).toHaveLength(1);
    expect(mailTo(clerk.email)).toHaveLength(0);

    expect((await clerk.agent.post(`/api/v1/bin-counts/${large.body.binCount.id}/decision`).send({ decision: 'approve' })).status).toBe(403);
    const approved = await quality.agent.post(`/api/v1/bin-counts/${large.body.binCount.id}/decision`).send({ decision: 'approve', note: 'found a torn bag' });
    expect(approved.body.binCount).toMatchObject({ status: 'approved', bookQuantity: 900 });
    expect((await PartStock.findByPk(part.id))!.onHand).toBe(900);
    expect(await StockMovement.sum('delta', { where: { binId: bin.id, reason: 'adjustment' } })).toBe(-100);
    const twice = await quality.agent.post(`/api/v1/bin-counts/${large.body.binCount.id}/decision`).send({ decision: 'reject' });
    expect(twice.status).toBe(422);
  });

  it('keeps four eyes on a variance: whoever counted the bin cannot decide it, someone else can; the site may switch it off', async () => {
    const quality = await signedIn('quality');
    const other = await signedIn('quality');
    const admin = await signedIn('admin');
    const part = await createPart({ pieceSpread: 0.001 });
    const scale = await createScale({ divisionG: 0.01, eG: 0.1, capacityG: 600, repeatabilityG: 0 });
    const bin = await newBin(admin.agent, part.id, 1000);
    // Book 1 000, counted 500 by a quality engineer, who then tries to approve it.
    const own = await quality.agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send(binCapture(part.id, scale.id, bin, 500));
    expect(own.body.binCount.status).toBe('pending');
    const self = await quality.agent.post(`/api/v1/bin-counts/${own.body.binCount.id}/decision`).send({ decision: 'approve' });
    expect(self.status).toBe(403);
    expect(self.body.error.message).toMatch(/You counted this bin/);
    testDb();
    expect((await Bin.findByPk(bin.id))!.bookQuantity).toBe(1000);
    expect((await other.agent.post(`/api/v1/bin-counts/${own.body.binCount.id}/decision`).send({ decision: 'reject' })).status).toBe(200);

    // Switched off (a one-person stockroom), the counter may decide.
    const { settings } = (await admin.agent.get('/api/v1/settings')).body;
    expect(settings.fourEyesVariances).toBe(true);
    const off = await admin.agent.patch('/api/v1/settings').send({ fourEyesVariances: false, version: settings.version });
    try {
      const again = await quality.agent
        .post('/api/v1/counts')
        .set('Idempotency-Key', randomUUID())
        .send(binCapture(part.id, scale.id, { id: bin.id, version: (await Bin.findByPk(bin.id))!.version }, 500));
      expect((await quality.agent.post(`/api/v1/bin-counts/${again.body.binCount.id}/decision`).send({ decision: 'reject' })).status).toBe(200);
    } finally {
      await admin.agent.patch('/api/v1/settings').send({ fourEyesVariances: true, version: off.body.settings.version });
    }
  });

  it('puts a bin whose variance was rejected first on the count plan again, and tells the clerks why', async () => {
    const clerk = await signedIn('clerk');
    const planner = await signedIn('planner');
    const part = await createPart({ pieceSpread: 0.001 });
    const scale = await createScale({ divisionG: 0.01, eG: 0.1, capacityG: 600, repeatabilityG: 0 });
    const bin = await newBin(clerk.agent, part.id, 1000);
    const large = await clerk.agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send(binCapture(part.id, scale.id, bin, 900));
    expect(large.body.binCount.status).toBe('pending');
    testDb();
    expect((await Bin.findByPk(bin.id))!.lastCountedAt).not.toBeNull();
    const rejected = await planner.agent
      .post(`/api/v1/bin-counts/${large.body.binCount.id}/decision`)
      .send({ decision: 'reject', note: 'the tote was half on the pan' });
    expect(rejected.status).toBe(200);
    expect(rejected.body.binCount).toMatchObject({ status: 'rejected', bookQuantity: 1000 });
    expect((await Bin.findByPk(bin.id))!.lastCountedAt).toBeNull();
    const due = await clerk.agent.get('/api/v1/bins/due');
    expect(due.body.bins.map((b: { code: string }) => b.code)).toContain(bin.code);
    const [mail] = await waitForMail(clerk.email);
    expect(mail.subject).toBe(`Count bin ${bin.code} again: its count of 900 was rejected`);
    expect(mail.text).toContain('the tote was half on the pan');
  });

  it('mails the planners when an approved shortfall leaves released orders holding more than is on hand', async () => {
    const clerk = await signedIn('clerk');
    const planner = await signedIn('planner');
    const part = await createPart({ pieceSpread: 0.001 });
    const scale = await createScale({ divisionG: 0.01, eG: 0.1, capacityG: 600, repeatabilityG: 0 });
    const bin = await newBin(clerk.agent, part.id, 1000);
    // A released order holds 800 of the 1 000.
    const kit = await planner.agent.post('/api/v1/kits').send({
      code: `SHORT-${randomUUID().slice(0, 8)}`.toUpperCase(),
      revision: 'A',
      description: 'Holds most of a bin',
      components: [{ partId: part.id, quantity: 8 }],
    });
    const order = await planner.agent.post('/api/v1/orders').send({ kitId: kit.body.kit.id, quantity: 100 });
    expect((await planner.agent.post(`/api/v1/orders/${order.body.order.id}/release`).send({ version: order.body.order.version })).status).toBe(200);
    // Counted 600, and the shortfall approved: 600 on hand against 800 held.
    const count = await clerk.agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send(binCapture(part.id, scale.id, bin, 600));
    expect(count.body.binCount.status).toBe('pending');
    expect(
      (await planner.agent.post(`/api/v1/bin-counts/${count.body.binCount.id}/decision`).send({ decision: 'approve', note: 'tote was split' })).status,
    ).toBe(200);
    testDb();
    expect(await PartStock.findByPk(part.id)).toMatchObject({ onHand: 600, reserved: 800 });
    // The planner heard of the variance waiting, then of the shortage its approval made.
    const short = (await waitForMail(planner.email, 2)).find((m) => m.subject.startsWith('Short of stock'));
    expect(short?.subject).toBe(`Short of stock: ${part.partNumber} is 200 below what released orders hold`);
    expect(short?.text).toContain(order.body.order.number);
    expect(short?.text).toMatch(/600 on hand, while released orders hold 800/);
  });

  it('lets one of two clerks counting the same bin win; the other gets 409 and recounts, and nothing is lost', async () => {
    const a = await signedIn('clerk');
    const b = await signedIn('clerk');
    const part = await createPart({ pieceSpread: 0.001 });
    const scale = await createScale({ divisionG: 0.01, eG: 0.1, capacityG: 600, repeatabilityG: 0 });
    const bin = await newBin(a.agent, part.id, 500);
    const [first, second] = await Promise.all([
      a.agent
        .post('/api/v1/counts')
        .set('Idempotency-Key', randomUUID())
        .send(binCapture(part.id, scale.id, bin, 498)),
      b.agent
        .post('/api/v1/counts')
        .set('Idempotency-Key', randomUUID())
        .send(binCapture(part.id, scale.id, bin, 499)),
    ]);
    const statuses = [first.status, second.status].sort();
    expect(statuses).toEqual([201, 409]);
    const loser = first.status === 409 ? first : second;
    expect(loser.body.error.code).toBe('stale_version');
    testDb();
    const fresh = await Bin.findByPk(bin.id);
    const retry = await b.agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send(binCapture(part.id, scale.id, { id: bin.id, version: fresh!.version }, 499));
    expect(retry.status).toBe(201);
    const final = await Bin.findByPk(bin.id);
    expect(final!.bookQuantity).toBe(499);
    expect(await StockMovement.sum('delta', { where: { binId: bin.id } })).toBe(499);
  });

  it('plans cycle counts: never-counted bins are due, freshly counted ones are not', async () => {
    const clerk = await signedIn('clerk');
    const part = await createPart({ pieceSpread: 0.001 });
    const scale = await createScale({ divisionG: 0.01, eG: 0.1, capacityG: 600, repeatabilityG: 0 });
    const counted = await newBin(clerk.agent, part.id, 100, 'A');
    const waiting = await newBin(clerk.agent, part.id, 100, 'C');
    const capture = await clerk.agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send(binCapture(part.id, scale.id, counted, 100));
    expect(capture.status, JSON.stringify(capture.body)).toBe(201);
    const due = (await clerk.agent.get('/api/v1/bins/due')).body.bins.map((x: { id: number }) => x.id);
    expect(due).toContain(waiting.id);
    expect(due).not.toContain(counted.id);
  });
});
