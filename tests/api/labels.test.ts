import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { PDFDocument } from 'pdf-lib';
import { BuildOrder } from '../../models';
import { decodePdf, isPdf } from '../helpers/decode-pdf';
import { createPart, stockPart, testDb } from '../helpers/db';
import { releasedOrder } from '../helpers/orders';
import { startAnotherApp } from '../helpers/app-process';
import { baseUrl, signedIn, type Agent } from '../helpers/http';

const GS = '\x1d';

// supertest keeps binary bodies as Buffers only when told to.
function binary(req: ReturnType<Agent['get']>) {
  return req.buffer(true).parse((res, done) => {
    const chunks: Buffer[] = [];
    res.on('data', (c: Buffer) => chunks.push(c));
    res.on('end', () => done(null, Buffer.concat(chunks)));
  });
}

describe('label PDFs', () => {
  it('a bin label: one page whose Code 128 is exactly the bin code and whose QR opens the part page', async () => {
    const { agent } = await signedIn('clerk');
    const part = await createPart();
    const bin = await stockPart(part.id, 40);
    const res = await binary(agent.get(`/api/v1/bins/${bin.id}/label.pdf?stock=2x1in`));
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toBe(`inline; filename="bin-${bin.code}-2x1in.pdf"`);
    expect(isPdf(res.body)).toBe(true);
    const pages = await decodePdf(res.body);
    expect(pages).toHaveLength(1);
    expect(pages[0].map((s) => [s.format, s.text]).sort()).toEqual([
      ['Code128', bin.code],
      ['QRCode', `${baseUrl()}/parts/${part.id}`],
    ]);
  });

  it('defaults the bin label to the 4 × 2 in stock', async () => {
    const { agent } = await signedIn('planner');
    const bin = await stockPart((await createPart()).id, 1);
    const res = await binary(agent.get(`/api/v1/bins/${bin.id}/label.pdf`));
    const doc = await PDFDocument.load(res.body);
    expect(doc.getPages().map((p) => [p.getWidth(), p.getHeight()])).toEqual([[288, 144]]);
  });

  it('refuses an unknown stock with 400 and an unknown bin with 404', async () => {
    const { agent } = await signedIn('admin');
    const bad = await agent.get('/api/v1/bins/1/label.pdf?stock=3x3in');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.stock).toMatch(/4x2in/);
    expect((await agent.get('/api/v1/bins/99999999/label.pdf')).status).toBe(404);
  });

  it('prints one label per id, in order, on a Letter sheet', async () => {
    const { agent } = await signedIn('clerk');
    const bins = [await stockPart((await createPart()).id, 1), await stockPart((await createPart()).id, 1)];
    const res = await binary(agent.post('/api/v1/labels').send({ template: 'bin', stock: 'letter-30up', ids: bins.map((b) => b.id) }));
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toBe('inline; filename="bin-2-labels-letter-30up.pdf"');
    const [page] = await decodePdf(res.body);
    expect(
      page
        .filter((s) => s.format === 'Code128')
        .map((s) => s.text)
        .sort(),
    ).toEqual(bins.map((b) => b.code).sort());
  });

  it('a part label carries the part number in Code 128 and the part page in the QR', async () => {
    const { agent } = await signedIn('planner');
    const part = await createPart();
    const res = await binary(agent.post('/api/v1/labels').send({ template: 'part', stock: '4x2in', ids: [part.id] }));
    expect(res.status).toBe(200);
    const [page] = await decodePdf(res.body);
    expect(page.map((s) => [s.format, s.text]).sort()).toEqual([
      ['Code128', part.partNumber],
      ['QRCode', `${baseUrl()}/parts/${part.id}`],
    ]);
  });

  it('a kit label for a released build order: GS1-128 and GS1 DataMatrix with kit:revision, order number and kit count', async () => {
    const { agent } = await signedIn('planner');
    const { kit, order } = await releasedOrder(agent, { quantity: 12 });
    const res = await binary(agent.post('/api/v1/labels').send({ template: 'kit', stock: '4x6in', ids: [order.id] }));
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toBe(`inline; filename="kit-${order.number}-4x6in.pdf"`);
    const [page] = await decodePdf(res.body);
    const matrix = page.find((s) => s.format === 'DataMatrix')!;
    // GS1 DataMatrix (]d2): company-internal AIs (91) kit:rev, (92) order, (93) count, FNC1 as GS between them.
    expect(matrix).toMatchObject({
      symbologyIdentifier: ']d2',
      raw: `91${kit.code}:C${GS}92${order.number}${GS}9312`,
      text: `(91)${kit.code}:C(92)${order.number}(93)12`,
    });
    expect(
      page
        .filter((s) => s.format === 'Code128')
        .map((s) => [s.symbologyIdentifier, s.text])
        .sort(),
    ).toEqual([
      [']C1', `(91)${kit.code}:C`],
      [']C1', `(92)${order.number}(93)12`],
    ]);
  });

  it('refuses a kit label for a draft order (422) and on a stock too small for it (400)', async () => {
    const { agent } = await signedIn('planner');
    const { order } = await releasedOrder(agent, { status: 'draft' });
    const draft = await agent.post('/api/v1/labels').send({ template: 'kit', stock: '4x2in', ids: [order.id] });
    expect(draft.status).toBe(422);
    expect(draft.body.error.message).toContain(`${order.number} is draft`);
    const small = await agent.post('/api/v1/labels').send({ template: 'kit', stock: '2x1in', ids: [order.id] });
    expect(small.status).toBe(400);
    expect(small.body.error.fields.stock).toMatch(/4x6in or 4x2in/);
  });

  it('answers bad input with 400 and a message per field, and unknown ids with 404 naming them', async () => {
    const { agent } = await signedIn('clerk');
    const empty = await agent.post('/api/v1/labels').send({});
    expect(empty.status).toBe(400);
    expect(Object.keys(empty.body.error.fields).sort()).toEqual(['ids', 'stock', 'template']);
    const bad = await agent.post('/api/v1/labels').send({ template: 'box', stock: '4x2in', ids: ['a', -1] });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toMatchObject({
      template: 'Template must be bin, part or kit',
      'ids.0': 'Each id must be a record id',
      'ids.1': 'Each id must be a record id',
    });
    expect((await agent.post('/api/v1/labels').send({ template: 'bin', stock: '4x2in', ids: [] })).body.error.fields.ids).toBe('Give at least one id');
    const tooMany = await agent.post('/api/v1/labels').send({ template: 'bin', stock: '4x2in', ids: Array.from({ length: 1001 }, (_, i) => i + 1) });
    expect(tooMany.body.error.fields.ids).toBe('At most 1000 labels at a time');
    const part = await createPart();
    const unknown = await agent.post('/api/v1/labels').send({ template: 'part', stock: '4x2in', ids: [part.id, 99999998, 99999999] });
    expect(unknown.status).toBe(404);
    expect(unknown.body.error.fields.ids).toBe('no such part: 99999998, 99999999');
  });
});

describe('label rendering off the request thread', () => {
  it(
    'renders in a worker pool with a bounded queue: past it a render is refused with 503 and Retry-After, health keeps answering',
    { timeout: 90_000 },
    async () => {
      const app = await startAnotherApp({ LABEL_QUEUE_LIMIT: '1' });
      try {
        const { agent } = await signedIn('clerk', app.url);
        const bin = await stockPart((await createPart()).id, 1);
        const body = { template: 'bin', stock: '2x1in', ids: Array.from({ length: 400 }, () => bin.id) };
        // Warm the pool, so every request below meets a running worker.
        expect((await binary(agent.post('/api/v1/labels').send({ ...body, ids: [bin.id] }))).status).toBe(200);
        const renders = Promise.all(Array.from({ length: 5 }, () => binary(agent.post('/api/v1/labels').send(body))));
        // While they render, the app answers other requests.
        const health = await request(app.url).get('/api/v1/health');
        expect(health.status).toBe(200);
        const answers = await renders;
        const statuses = answers.map((r) => r.status).sort();
        expect(
          statuses.every((st) => st === 200 || st === 503),
          statuses.join(','),
        ).toBe(true);
        // One rendering and one waiting at the most: of five sent at once, some were turned away.
        expect(statuses.filter((st) => st === 503).length).toBeGreaterThan(0);
        const refused = answers.find((r) => r.status === 503)!;
        expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
        const done = answers.find((r) => r.status === 200)!;
        expect(isPdf(done.body)).toBe(true);
        expect((await PDFDocument.load(done.body)).getPageCount()).toBe(400);
      } finally {
        app.child.kill('SIGKILL');
      }
    },
  );
});

describe('kit label order status', () => {
  it('also prints for a completed order', async () => {
    const { agent } = await signedIn('planner');
    const { order } = await releasedOrder(agent);
    testDb();
    await BuildOrder.update({ status: 'complete', completedAt: new Date() }, { where: { id: order.id } });
    expect((await agent.post('/api/v1/labels').send({ template: 'kit', stock: '4x2in', ids: [order.id] })).status).toBe(200);
  });
});
