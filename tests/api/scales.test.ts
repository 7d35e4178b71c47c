import { describe, expect, it } from 'vitest';
import { unique } from '../helpers/db';
import { signedIn } from '../helpers/http';

const bench = () => ({
  name: unique('Bench scale'),
  capacity: 6,
  division: 0.0001,
  verificationInterval: 0.001,
  unit: 'kg',
  accuracyClass: 'III',
  connection: { kind: 'serial', baudRate: 9600, lineFormat: 'signed-unit-flag', mode: 'polled', pollRequest: 'W\\r\\n' },
});

describe('scales and containers', () => {
  it('creates a scale in grams with Min from the class rule (OIML R 76-1 Table 3: class III, Min = 20 e)', async () => {
    const { agent } = await signedIn('admin');
    const res = await agent.post('/api/v1/scales').send(bench());
    expect(res.status).toBe(201);
    expect(res.body.scale).toMatchObject({
      unit: 'g',
      capacity: 6000,
      division: 0.1,
      verificationInterval: 1,
      minLoad: 20,
      intervals: 6000,
      status: 'in_service',
    });
    expect(res.body.scale.connection).toMatchObject({ kind: 'serial', dataBits: 8, parity: 'none', stopBits: 1, pollIntervalMs: 200 });
  });

  it('refuses a profile that breaks its accuracy class or has e below d', async () => {
    const { agent } = await signedIn('admin');
    const res = await agent.post('/api/v1/scales').send({ ...bench(), verificationInterval: 0.0005, division: 0.001 });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.verificationInterval).toMatch(/d ≤ e/);
    expect(res.body.error.fields.accuracyClass).toMatch(/at most 10000/);
  });

  it('refuses an unknown line format or baud rate with field messages', async () => {
    const { agent } = await signedIn('admin');
    const res = await agent.post('/api/v1/scales').send({ ...bench(), connection: { kind: 'serial', baudRate: 1234, lineFormat: 'vendor-x' } });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['connection.baudRate', 'connection.lineFormat']);
  });

  it('edits a profile with the loaded version only', async () => {
    const { agent } = await signedIn('admin');
    const { scale } = (await agent.post('/api/v1/scales').send(bench())).body;
    const ok = await agent.patch(`/api/v1/scales/${scale.id}`).send({ location: 'Kitting bench 3', repeatability: 0.05, version: scale.version });
    expect(ok.status).toBe(200);
    expect(ok.body.scale).toMatchObject({ location: 'Kitting bench 3', repeatability: 0.05 });
    expect((await agent.patch(`/api/v1/scales/${scale.id}`).send({ location: 'x', version: scale.version })).status).toBe(409);
  });

  it('keeps containers with their tare in grams', async () => {
    const { agent } = await signedIn('clerk');
    const res = await agent.post('/api/v1/containers').send({ name: unique('Tray'), kind: 'tray', tare: 4.2, unit: 'oz' });
    expect(res.status).toBe(201);
    // 4.2 oz × 28.349 523 125 g/oz (NIST SP 811, exact)
    expect(res.body.container.tare).toBeCloseTo(119.067997125, 5);
    const edited = await agent.patch(`/api/v1/containers/${res.body.container.id}`).send({ tare: 120, version: res.body.container.version });
    expect(edited.body.container.tare).toBe(120);
    const bad = await agent.post('/api/v1/containers').send({ name: 'x', kind: 'crate', tare: -1 });
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['kind', 'tare']);
  });

  // Found by fuzzing: both answered 500. 10^6 kg passes the schema but is 10^9 g, beyond DECIMAL(14,6).
  it('refuses a tare too large to store, in grams or on the way there, and keeps the container as it was', async () => {
    const { agent } = await signedIn('clerk');
    const { container } = (await agent.post('/api/v1/containers').send({ name: unique('Tote'), kind: 'tote', tare: 120 })).body;
    const overColumn = await agent.patch(`/api/v1/containers/${container.id}`).send({ tare: 1_000_000, unit: 'kg', version: container.version });
    expect(overColumn.status).toBe(400);
    expect(overColumn.body.error.fields).toEqual({ _: 'a number is out of the range that can be stored' });
    const infinite = await agent.patch(`/api/v1/containers/${container.id}`).send({ tare: Number.MAX_VALUE, unit: 'kg', version: container.version });
    expect(infinite.status).toBe(400);
    expect(infinite.body.error.fields.tare).toMatch(/implausibly large/);
    const again = await agent.patch(`/api/v1/containers/${container.id}`).send({ tare: 121, version: container.version });
    expect(again.body.container).toMatchObject({ tare: 121, version: container.version + 1 });
  });
});
