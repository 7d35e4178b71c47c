import { randomUUID } from 'node:crypto';
import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { createPart, createScale, stockPart, unique } from '../helpers/db';
import { signedIn, type Agent } from '../helpers/http';

// A part count of `pieces` pieces at 0.5 g from a sample of 20 weighed apart.
function capture(agent: Agent, partId: number, scaleId: number, pieces: number) {
  return agent
    .post('/api/v1/counts')
    .set('Idempotency-Key', randomUUID())
    .send({
      purpose: 'part',
      partId,
      scaleId,
      unit: 'g',
      gross: pieces * 0.5,
      tare: 0,
      sample: { quantity: 20, netWeight: 10 },
      sampleOnPan: false,
      stable: true,
    });
}

describe('count log', () => {
  it('downloads the filtered log as CSV, newest first, with names, uncertainty and warning codes', async () => {
    const { agent } = await signedIn('operator');
    // A spread of 2 % makes 40 pieces exact and 400 not (the APW from 20 pieces is too loose for 400).
    const part = await createPart({ partNumber: unique('=LOG').toUpperCase(), pieceSpread: 0.02 });
    const other = await createPart();
    const scale = await createScale({ divisionG: 0.01, eG: 0.1, repeatabilityG: 0.005 });
    for (const pieces of [40, 400]) expect((await capture(agent, part.id, scale.id, pieces)).status).toBe(201);
    expect((await capture(agent, other.id, scale.id, 40)).status).toBe(201);

    const res = await agent.get('/api/v1/counts/export').query({ partNumber: part.partNumber.toLowerCase(), scaleId: '', purpose: 'part' });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="count-log-\d{4}-\d{2}-\d{2}\.csv"$/);
    const rows: Record<string, string>[] = parse(res.text, { columns: true });
    expect(rows.map((r) => r.count)).toEqual(['400', '40']);
    // The part number starts with "=": the cell is made plain text (OWASP CSV injection).
    expect(rows[0].part_number).toBe(`'${part.partNumber}`);
    expect(rows[0]).toMatchObject({
      purpose: 'part',
      scale: scale.name,
      counted_by: expect.stringMatching(/\S/),
      order: '',
      bin: '',
      net_g: '200',
      sample_pcs: '20',
      apw_g: '0.5',
    });
    expect(Number(rows[0].expanded_uncertainty_pcs_k2)).toBeGreaterThan(Number(rows[1].expanded_uncertainty_pcs_k2));
    expect(rows[0].counted_at_utc).toMatch(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/);

    const notExact: Record<string, string>[] = parse((await agent.get('/api/v1/counts/export').query({ partNumber: part.partNumber, notExact: '1' })).text, {
      columns: true,
    });
    expect(notExact.map((r) => r.count)).toEqual(['400']);
    expect(notExact[0].exact).toBe('no');
    expect(notExact[0].warnings.split(' ')).toContain('count_not_exact');
    expect(rows[1].exact).toBe('yes');
  });

  it('names the bin a bin count was for', async () => {
    const { agent } = await signedIn('clerk');
    const part = await createPart({ pieceSpread: 0.002 });
    const scale = await createScale({ divisionG: 0.01, eG: 0.1, repeatabilityG: 0.005 });
    const bin = await stockPart(part.id, 30);
    const res = await agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send({
        purpose: 'bin',
        binId: bin.id,
        binVersion: bin.version,
        partId: part.id,
        scaleId: scale.id,
        gross: 15,
        tare: 0,
        sample: { quantity: 20, netWeight: 10 },
        sampleOnPan: false,
        stable: true,
      });
    expect(res.status).toBe(201);
    const rows: Record<string, string>[] = parse((await agent.get('/api/v1/counts/export').query({ partNumber: part.partNumber, purpose: 'bin' })).text, {
      columns: true,
    });
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ purpose: 'bin', bin: bin.code, order: '', count: '30' });
  });

  it('refuses filters it cannot read with field messages', async () => {
    const { agent } = await signedIn('planner');
    const res = await agent.get('/api/v1/counts/export').query({ scaleId: '1e3', from: '2026-13-01', purpose: 'weighing', notExact: 'yes', page: '0' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['from', 'notExact', 'page', 'purpose', 'scaleId']);
  });

  it('shows the page with its filters applied, and says which filters it could not read', async () => {
    const { agent } = await signedIn('quality');
    const part = await createPart();
    const scale = await createScale();
    expect((await capture(agent, part.id, scale.id, 60)).status).toBe(201);
    const page = await agent.get(`/counts?partNumber=${part.partNumber}&purpose=&scaleId=${scale.id}`);
    expect(page.status).toBe(200);
    expect(page.text).toContain('1–1 of 1 count.');
    expect(page.text).toContain(`/api/v1/counts/export?partNumber=${part.partNumber}&amp;scaleId=${scale.id}`);
    const bad = await agent.get('/counts?from=yesterday');
    expect(bad.status).toBe(200);
    expect(bad.text).toContain('These filters were not understood');
  });
});
