// Every list route answers one page and says where it sits: rows, total, page and pageSize.
import { Op } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { Bin } from '../../models';
import { createPart, testDb, unique } from '../helpers/db';
import { signedIn } from '../helpers/http';

// Three codes in one random zone that no other test holds yet.
async function threeFreeCodes(): Promise<string[]> {
  const letters = 'GHJKMNPRTUVWXY';
  for (;;) {
    const zone = Array.from({ length: 2 }, () => letters[Math.floor(Math.random() * letters.length)]).join('');
    if (!(await Bin.count({ where: { code: { [Op.startsWith]: `${zone}-9` } } }))) return [1, 2, 3].map((slot) => `${zone}-9${slot}-9-9${slot}`);
  }
}

describe('list routes answer pages', () => {
  it('pages the bins of one part and finds them by the start of the part number or the code', async () => {
    const { agent } = await signedIn('clerk');
    const part = await createPart({ partNumber: unique('PG_%').toUpperCase() });
    testDb();
    const codes = await threeFreeCodes();
    for (const code of codes) await Bin.create({ code, partId: part.id, containerId: null, bookQuantity: 5, abcClass: 'C', lastCountedAt: null });

    const first = await agent.get(`/api/v1/bins?q=${encodeURIComponent(part.partNumber)}&pageSize=2`);
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ total: 3, page: 1, pageSize: 2 });
    expect(first.body.bins.map((b: { code: string }) => b.code)).toEqual(codes.slice(0, 2));
    const second = await agent.get(`/api/v1/bins?q=${encodeURIComponent(part.partNumber)}&pageSize=2&page=2`);
    expect(second.body.bins.map((b: { code: string }) => b.code)).toEqual(codes.slice(2));
    // The part number holds "_" and "%": typed, they match only themselves.
    const wild = await agent.get(`/api/v1/bins?q=${encodeURIComponent(part.partNumber.replace('_%', '__'))}`);
    expect(wild.body.total).toBe(0);
    const byCode = await agent.get(`/api/v1/bins?q=${codes[2].slice(0, 6).toLowerCase()}&pageSize=500`);
    expect(byCode.body.bins.map((b: { code: string }) => b.code)).toContain(codes[2]);
  });

  it('pages the orders of one kit, newest first, with their progress but not their lines', async () => {
    const { agent } = await signedIn('planner');
    const part = await createPart();
    const code = unique('KP').toUpperCase();
    const kit = await agent.post('/api/v1/kits').send({ code, revision: 'A', description: 'Paging kit', components: [{ partId: part.id, quantity: 2 }] });
    expect(kit.status).toBe(201);
    const made: number[] = [];
    for (let i = 0; i < 3; i += 1) made.push((await agent.post('/api/v1/orders').send({ kitId: kit.body.kit.id, quantity: 1 + i })).body.order.id);

    const first = await agent.get(`/api/v1/orders?q=${code.toLowerCase()}&pageSize=2`);
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ total: 3, page: 1, pageSize: 2 });
    expect(first.body.orders.map((o: { id: number }) => o.id)).toEqual([made[2], made[1]]);
    expect(first.body.orders[0].progress).toEqual({ linesDone: 0, lines: 1 });
    expect(first.body.orders[0]).not.toHaveProperty('lines');
    const drafts = await agent.get(`/api/v1/orders?q=${code}&status=draft&page=2&pageSize=2`);
    expect(drafts.body.orders.map((o: { id: number }) => o.id)).toEqual([made[0]]);
    const none = await agent.get(`/api/v1/orders?q=${code}&status=complete`);
    expect(none.body).toMatchObject({ orders: [], total: 0 });
  });

  it.each(['/api/v1/orders', '/api/v1/bins', '/api/v1/parts', '/api/v1/counts'])(
    'refuses a page larger than 500 rows or past a million pages: %s',
    async (path) => {
      const { agent } = await signedIn('planner');
      const big = await agent.get(`${path}?pageSize=501`);
      expect(big.status).toBe(400);
      expect(big.body.error.fields.pageSize).toBeTruthy();
      const far = await agent.get(`${path}?page=1000001`);
      expect(far.status).toBe(400);
      expect(far.body.error.fields.page).toBeTruthy();
      expect((await agent.get(`${path}?page=999999&pageSize=500`)).status).toBe(200);
    },
  );
});
