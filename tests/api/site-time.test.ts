import { randomUUID } from 'node:crypto';
import { parse } from 'csv-parse/sync';
import { DateTime } from 'luxon';
import { afterEach, describe, expect, it } from 'vitest';
import { createPart, createScale } from '../helpers/db';
import { signedIn, type Agent } from '../helpers/http';
import { releasedOrder } from '../helpers/orders';

// Luxon (an npm zone library the product does not use) is the reference for what day and time it
// is at the site. UTC+14 puts the site's day ahead of UTC's for most of the day.
const ZONE = 'Pacific/Kiritimati';

async function setZone(agent: Agent, timeZone: string | null) {
  const { settings } = (await agent.get('/api/v1/settings')).body;
  const res = await agent.patch('/api/v1/settings').send({ timeZone, version: settings.version });
  expect(res.status).toBe(200);
  return res.body.settings;
}

describe('site time zone', () => {
  afterEach(async () => {
    const { agent } = await signedIn('admin');
    await setZone(agent, null);
  });

  it("follows the server's zone until an admin sets an IANA zone, and names a bad one", async () => {
    const { agent } = await signedIn('admin');
    const { settings } = (await agent.get('/api/v1/settings')).body;
    expect(settings).toMatchObject({ timeZone: 'UTC', timeZoneFromServer: true });
    const bad = await agent.patch('/api/v1/settings').send({ timeZone: 'Mars/Olympus_Mons', version: settings.version });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.timeZone).toMatch(/time zone/i);
    expect(await setZone(agent, ZONE)).toMatchObject({ timeZone: ZONE, timeZoneFromServer: false });
  });

  it("filters the count log by the site's days and writes its clock in the CSV", async () => {
    const { agent: admin } = await signedIn('admin');
    await setZone(admin, ZONE);
    const { agent } = await signedIn('operator');
    const part = await createPart();
    const scale = await createScale();
    const made = await agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send({
        purpose: 'part',
        partId: part.id,
        scaleId: scale.id,
        unit: 'g',
        gross: 20,
        tare: 0,
        sample: { quantity: 20, netWeight: 10 },
        sampleOnPan: false,
        stable: true,
      });
    expect(made.status).toBe(201);
    const at = DateTime.fromISO(made.body.count.createdAt, { zone: ZONE });
    const day = at.toISODate()!;
    const dayBefore = at.minus({ days: 1 }).toISODate()!;

    const ids = async (from: string, to: string) =>
      (await agent.get('/api/v1/counts').query({ partId: part.id, from, to })).body.counts.map((c: { id: number }) => c.id);
    expect(await ids(day, day)).toEqual([made.body.count.id]);
    expect(await ids(dayBefore, dayBefore)).toEqual([]);

    const csv = await agent.get('/api/v1/counts/export').query({ partNumber: part.partNumber });
    expect(csv.headers['content-disposition']).toContain(`count-log-${DateTime.now().setZone(ZONE).toISODate()}.csv`);
    const [row] = parse(csv.text, { columns: true }) as Record<string, string>[];
    expect(row.counted_at_site).toBe(DateTime.fromISO(row.counted_at_utc, { zone: ZONE }).toFormat('yyyy-MM-dd HH:mm'));
  });

  it("numbers build orders by the site's year", async () => {
    const { agent: admin } = await signedIn('admin');
    await setZone(admin, ZONE);
    const { agent } = await signedIn('planner');
    const { order } = await releasedOrder(agent, { status: 'draft' });
    expect(order.number).toMatch(new RegExp(`^BO-${DateTime.now().setZone(ZONE).year}-\\d{5}$`));
  });
});
