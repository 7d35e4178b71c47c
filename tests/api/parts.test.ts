import { describe, expect, it } from 'vitest';
import { Part } from '../../models';
import { createPart, createScale, testDb, unique } from '../helpers/db';
import { signedIn } from '../helpers/http';

describe('parts and samples', () => {
  it('creates a part with an upper-case part number, refuses a duplicate with 409 and bad fields with 400', async () => {
    const { agent } = await signedIn('planner');
    const number = unique('scr-m3x8');
    const res = await agent.post('/api/v1/parts').send({ partNumber: number, description: 'Pan head screw M3 × 8' });
    expect(res.status).toBe(201);
    expect(res.body.part).toMatchObject({ partNumber: number.toUpperCase(), countingMethod: 'scale', averagePieceWeight: null, spreadLearned: false });
    const dup = await agent.post('/api/v1/parts').send({ partNumber: number, description: 'again' });
    expect(dup.status).toBe(409);
    const bad = await agent.post('/api/v1/parts').send({ partNumber: 'has space', description: '' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['description', 'partNumber']);
  });

  it('searches and pages the part list on the server', async () => {
    const { agent } = await signedIn('operator');
    const tag = unique('WSH').toUpperCase();
    for (let i = 0; i < 3; i++) await createPart({ partNumber: `${tag}-${i}` });
    const page = await agent.get(`/api/v1/parts?q=${tag}&pageSize=2&sort=partNumber&dir=desc`);
    expect(page.status).toBe(200);
    expect(page.body.total).toBe(3);
    expect(page.body.parts.map((p: { partNumber: string }) => p.partNumber)).toEqual([`${tag}-2`, `${tag}-1`]);
    expect((await agent.get('/api/v1/parts?pageSize=0')).status).toBe(400);
  });

  it('answers an id that is not valid percent-encoding with a JSON 400, not a bare 500 (found by fuzzing)', async () => {
    const { agent } = await signedIn('clerk');
    for (const id of ['%ZZ', '%ED%A0%80']) {
      const res = await agent.patch(`/api/v1/parts/${id}`).send({ description: 'x', version: 0 });
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('bad_request');
    }
  });

  it('updates with the loaded version and answers a stale one with 409', async () => {
    const { agent } = await signedIn('clerk');
    const part = await createPart();
    const ok = await agent.patch(`/api/v1/parts/${part.id}`).send({ description: 'Spring washer M4', version: part.version });
    expect(ok.status).toBe(200);
    const stale = await agent.patch(`/api/v1/parts/${part.id}`).send({ description: 'Other', version: part.version });
    expect(stale.status).toBe(409);
  });

  it('learns the APW from a sample and the spread from piece-by-piece increments', async () => {
    const { agent } = await signedIn('operator');
    const part = await createPart();
    const scale = await createScale({ divisionG: 0.001, eG: 0.01, capacityG: 600, repeatabilityG: 0 });
    // Ten pieces of 1.2 g ± 0.012 g (c = 1 %), added one at a time.
    const increments = [1.2, 1.212, 1.188, 1.2, 1.224, 1.176, 1.2, 1.206, 1.194, 1.2];
    const net = increments.reduce((a, b) => a + b, 0);
    const res = await agent.post(`/api/v1/parts/${part.id}/samples`).send({ scaleId: scale.id, quantity: 10, netWeight: net, increments });
    expect(res.status).toBe(201);
    expect(res.body.part.averagePieceWeight).toBeCloseTo(1.2, 9);
    expect(res.body.part.spreadLearned).toBe(true);
    // sample standard deviation of the increments / mean (noise u(W) = 0.001·√(2/12) is negligible here)
    const mean = net / 10;
    const sd = Math.sqrt(increments.reduce((a, x) => a + (x - mean) ** 2, 0) / 9);
    expect(res.body.part.pieceSpread).toBeCloseTo(sd / mean, 3);
    expect(res.body.part.spreadDegreesOfFreedom).toBe(9);
    const list = await agent.get(`/api/v1/parts/${part.id}/samples`);
    expect(list.body.samples[0]).toMatchObject({ quantity: 10, pieceByPiece: true });
  });

  it('refuses increments that do not belong to the sample, samples of hand-counted parts, and locked scales', async () => {
    const { agent } = await signedIn('operator');
    const part = await createPart();
    const scale = await createScale({ eG: 0.01 });
    const wrongCount = await agent.post(`/api/v1/parts/${part.id}/samples`).send({ scaleId: scale.id, quantity: 3, netWeight: 3, increments: [1, 1] });
    expect(wrongCount.status).toBe(400);
    expect(wrongCount.body.error.fields.increments).toMatch(/expected 3/);
    const hand = await createPart({ countingMethod: 'hand' });
    expect((await agent.post(`/api/v1/parts/${hand.id}/samples`).send({ scaleId: scale.id, quantity: 3, netWeight: 3 })).status).toBe(422);
    const locked = await createScale({ status: 'locked' });
    const res = await agent.post(`/api/v1/parts/${part.id}/samples`).send({ scaleId: locked.id, quantity: 3, netWeight: 3 });
    expect(res.body.error.code).toBe('scale_locked');
    testDb();
    expect((await Part.findByPk(part.id))!.apwG).toBeNull();
  });
});
