import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { Scale } from '../../models';
import { createPart, createScale, createTestWeight, createUser, testDb } from '../helpers/db';
import { signedIn, type Agent } from '../helpers/http';
import { mailTo, waitForMail } from '../helpers/mail';
import { utcDay } from '../helpers/days';

const contractBody = {
  accuracyClass: 'III',
  verificationInterval: 0.5,
  capacity: 6000,
  unit: 'g',
  stage: 'initial',
  points: [{ load: 1000, indication: 1000.5 }],
  repeatability: { load: 3000, indications: [3000, 3000.5, 3000] },
  eccentricity: { load: 2000, indications: [2000, 2000.5, 1999.5, 2000] },
};

describe('calibration evaluate (contract)', () => {
  // OIML R 76-1 Table 6 with e = 0.5 g: 1 000 g is 2 000 e → ±1 e; 3 000 g and 2 000 g are above 2 000 e → ±1.5 e.
  it('judges each check against the MPE of its load', async () => {
    const { agent } = await signedIn('quality');
    const res = await agent.post('/api/v1/calibration/evaluate').send(contractBody);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      points: [{ load: 1000, indication: 1000.5, error: 0.5, mpe: 0.5, pass: true }],
      repeatability: { range: 0.5, mpe: 0.75, pass: true },
      eccentricity: { maxError: 0.5, mpe: 0.75, pass: true },
      minimumCapacity: 10,
      intervals: 12000,
      pass: true,
    });
  });

  it('answers in the request unit and doubles the MPE in service', async () => {
    const { agent } = await signedIn('admin');
    const kg = {
      ...contractBody,
      unit: 'kg',
      verificationInterval: 0.0005,
      capacity: 6,
      stage: 'in_service',
      points: [{ load: 3, indication: 3.0015 }],
      repeatability: null,
      eccentricity: null,
    };
    const res = await agent.post('/api/v1/calibration/evaluate').send(kg);
    expect(res.body.points[0]).toEqual({ load: 3, indication: 3.0015, error: 0.0015, mpe: 0.0015, pass: true });
    expect(res.body.minimumCapacity).toBe(0.01);
  });

  it('rejects bad input with fields', async () => {
    const { agent } = await signedIn('quality');
    const res = await agent.post('/api/v1/calibration/evaluate').send({ ...contractBody, accuracyClass: 'V', points: [], verificationInterval: 0 });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['accuracyClass', 'points', 'verificationInterval']);
  });
});

async function calibrate(agent: Agent, scaleId: number, indicationAt1000: number, weightIds: number[]) {
  return agent.post(`/api/v1/scales/${scaleId}/calibrations`).send({
    stage: 'in_service',
    points: [{ load: 1000, indication: indicationAt1000, testWeightIds: weightIds }],
    repeatability: { load: 1000, indications: [1000, 1000.1, 1000] },
  });
}

describe('calibration records and lock-out', () => {
  it('locks a scale that fails its test, refuses captures on it, and a passing record lifts the lock', async () => {
    const quality = await signedIn('quality');
    const operator = await signedIn('operator');
    const scale = await createScale(); // class III, e = 1 g, Max 6 kg: at 1 kg (1 000 e) the in-service MPE is 2 g
    const part = await createPart();
    const kilo = await createTestWeight(1000, 'F1'); // F1 1 kg: 5 mg, well under 1/3 of 2 g
    const failing = await calibrate(quality.agent, scale.id, 1003, [kilo.id]);
    expect(failing.status).toBe(201);
    expect(failing.body.record).toMatchObject({ pass: false, weightsAdequate: true });
    testDb();
    const locked = await Scale.findByPk(scale.id);
    expect(locked).toMatchObject({ status: 'locked' });
    expect(locked!.statusReason).toMatch(/error beyond MPE at 1000 g/);

    const capture = await operator.agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send({ purpose: 'part', partId: part.id, scaleId: scale.id, gross: 60, tare: 0, sample: { quantity: 10, netWeight: 6 }, stable: true });
    expect(capture.status).toBe(422);
    expect(capture.body.error.code).toBe('scale_locked');

    const passing = await calibrate(quality.agent, scale.id, 1001, [kilo.id]);
    expect(passing.body.record).toMatchObject({ pass: true });
    const back = await Scale.findByPk(scale.id);
    expect(back).toMatchObject({ status: 'in_service', statusReason: null });
    expect(back!.calibrationDueAt).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    expect(Number(back!.repeatabilityG)).toBeCloseTo(0.057735, 5); // s of 1000, 1000.1, 1000
    const list = await quality.agent.get(`/api/v1/scales/${scale.id}/calibrations`);
    expect(list.body.records.map((r: { pass: boolean }) => r.pass)).toEqual([true, false]);
  });

  it('fails a test whose weights are too coarse for the scale (more than 1/3 of its MPE) or out of date', async () => {
    const { agent } = await signedIn('quality');
    const scale = await createScale({ eG: 0.1, divisionG: 0.01, capacityG: 600 }); // at 200 g = 2 000 e: in-service MPE 0.2 g
    const coarse = await createTestWeight(200, 'M2'); // 30 mg = 0.03 g ≤ 0.0667 g: fine
    const rough = await createTestWeight(200, 'M3'); // 100 mg = 0.1 g > 0.0667 g: too coarse
    const stale = await createTestWeight(200, 'F1', '2020-01-01');
    const body = (id: number) => ({ stage: 'in_service', points: [{ load: 200, indication: 200.05, testWeightIds: [id] }] });
    expect((await agent.post(`/api/v1/scales/${scale.id}/calibrations`).send(body(coarse.id))).body.record.pass).toBe(true);
    const tooRough = await agent.post(`/api/v1/scales/${scale.id}/calibrations`).send(body(rough.id));
    expect(tooRough.body.record).toMatchObject({ pass: false, weightsAdequate: false });
    expect(tooRough.body.record.weightProblems[0]).toMatch(/exceeds 1\/3/);
    const outOfDate = await agent.post(`/api/v1/scales/${scale.id}/calibrations`).send(body(stale.id));
    expect(outOfDate.body.record.weightProblems[0]).toMatch(/due for recalibration/);
  });

  it('keeps test weights with their OIML R 111 MPE and refuses nominal values outside the series', async () => {
    const { agent } = await signedIn('quality');
    const ok = await agent.post('/api/v1/test-weights').send({ identifier: `tw-${randomUUID().slice(0, 6)}`, nominal: 0.5, unit: 'kg', weightClass: 'F2' });
    expect(ok.status).toBe(201);
    expect(ok.body.testWeight).toMatchObject({ nominal: 500, mpeMg: 8 });
    const odd = await agent.post('/api/v1/test-weights').send({ identifier: 'tw-odd', nominal: 3, weightClass: 'F1' });
    expect(odd.status).toBe(400);
    expect(odd.body.error.fields.nominal).toMatch(/1-2-5/);
  });

  it('lets quality lock a scale by hand with a reason', async () => {
    const { agent } = await signedIn('quality');
    const scale = await createScale();
    const res = await agent.post(`/api/v1/scales/${scale.id}/lock`).send({ reason: 'Dropped from the bench' });
    expect(res.body.scale).toMatchObject({ status: 'locked' });
    expect(res.body.scale.statusReason).toMatch(/Dropped/);
    expect((await agent.post(`/api/v1/scales/${scale.id}/lock`).send({ reason: '' })).status).toBe(400);
  });
});

describe('calibration reminders', () => {
  it('marks a scale due soon and mails quality once, however many runs race', async () => {
    const { agent, email } = await signedIn('quality');
    const scale = await createScale();
    const soon = new Date(Date.now() + 5 * 86_400_000).toISOString().slice(0, 10);
    await Scale.update({ calibrationDueAt: soon }, { where: { id: scale.id } });
    const runs = await Promise.all([1, 2, 3].map(() => agent.post('/api/v1/jobs/calibration-reminders')));
    expect(runs.every((r) => r.status === 200)).toBe(true);
    await waitForMail(email);
    await new Promise((r) => setTimeout(r, 300));
    expect(mailTo(email).filter((m) => m.subject.includes(scale.name))).toHaveLength(1);
    expect((await Scale.findByPk(scale.id))!.status).toBe('due');
  });

  it('locks a scale past its date and says so', async () => {
    const { agent, email } = await signedIn('quality');
    const scale = await createScale();
    await Scale.update({ calibrationDueAt: '2026-01-15' }, { where: { id: scale.id } });
    await agent.post('/api/v1/jobs/calibration-reminders');
    const locked = await Scale.findByPk(scale.id);
    expect(locked).toMatchObject({ status: 'locked', statusReason: 'Calibration overdue since 2026-01-15' });
    const mails = await waitForMail(email);
    expect(mails.some((m) => m.subject.startsWith(`Locked: ${scale.name}`))).toBe(true);
  });
});

describe('a scale past its calibration date', () => {
  it('refuses captures and samples at once, before the reminder job has locked it; on its due day it still counts', async () => {
    const { agent } = await signedIn('operator');
    const part = await createPart({ pieceSpread: 0.01 });
    const scale = await createScale();
    const capture = () =>
      agent
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
    // The test server's site days are UTC days (TZ=UTC).
    await Scale.update({ calibrationDueAt: utcDay(0) }, { where: { id: scale.id } });
    expect((await capture()).status).toBe(201);
    await Scale.update({ calibrationDueAt: utcDay(-1) }, { where: { id: scale.id } });
    const refused = await capture();
    expect(refused.status).toBe(422);
    expect(refused.body.error).toMatchObject({ code: 'scale_locked', message: expect.stringContaining(`was due for calibration on ${utcDay(-1)}`) });
    expect((await Scale.findByPk(scale.id))!.status).toBe('in_service');
    const sample = await agent
      .post(`/api/v1/parts/${part.id}/samples`)
      .send({ scaleId: scale.id, unit: 'g', quantity: 3, netWeight: 1.5, increments: [0.5, 0.5, 0.5] });
    expect(sample.status).toBe(422);
  });
});

describe('sampling plans and count audits', () => {
  it('answers the sampling-plan contract (ISO 2859-1: lot 500, level II, AQL 1.0 → H, 50, 1/2)', async () => {
    const { agent } = await signedIn('quality');
    const res = await agent.get('/api/v1/audits/sampling-plan?lotSize=500&level=II&aql=1.0');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ codeLetter: 'H', sampleSize: 50, accept: 1, reject: 2 });
    const bad = await agent.get('/api/v1/audits/sampling-plan?lotSize=1&aql=3');
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['aql', 'lotSize']);
  });

  it('samples a lot of captures with a recorded seed, judges recounts, and mails a rejected lot', async () => {
    const quality = await signedIn('quality');
    const planner = await signedIn('planner');
    const operator = await signedIn('operator');
    const part = await createPart({ pieceSpread: 0.001 });
    const scale = await createScale({ divisionG: 0.01, eG: 0.1, capacityG: 600, repeatabilityG: 0 });
    for (let i = 0; i < 10; i++) {
      const res = await operator.agent
        .post('/api/v1/counts')
        .set('Idempotency-Key', randomUUID())
        .send({ purpose: 'part', partId: part.id, scaleId: scale.id, gross: 25 + i * 0.25, tare: 0, sample: { quantity: 20, netWeight: 5 }, stable: true });
      expect(res.status).toBe(201);
    }
    const [from, today] = [utcDay(-1), utcDay()];
    // Lot of 10 → code letter B; at AQL 2.5 the arrow leads down to C: n = 5, Ac 0, Re 1.
    const created = await quality.agent.post('/api/v1/audits').send({ population: { from, to: today, partId: part.id }, aql: 2.5, seed: 12345 });
    expect(created.status).toBe(201);
    const audit = created.body.audit;
    expect(audit).toMatchObject({ lotSize: 10, codeLetter: 'B', sampleSize: 5, accept: 0, reject: 1, seed: 12345, status: 'open' });
    const again = await quality.agent.post('/api/v1/audits').send({ population: { from, to: today, partId: part.id }, aql: 2.5, seed: 12345 });
    expect(again.body.audit.items.map((i: { countEventId: number }) => i.countEventId)).toEqual(
      audit.items.map((i: { countEventId: number }) => i.countEventId),
    );

    // Key in recounts: all right except one that is two pieces off an exact count.
    let last;
    for (const [i, item] of audit.items.entries()) {
      last = await quality.agent.put(`/api/v1/audits/${audit.id}/items/${item.id}`).send({ handCount: i === 0 ? item.count - 2 : item.count });
      expect(last.status).toBe(200);
    }
    expect(last!.body.audit).toMatchObject({ status: 'closed', defects: 1, verdict: 'rejected' });
    const mails = await waitForMail(planner.email);
    expect(mails.some((m) => m.subject.startsWith(`Count audit ${audit.id} rejected`))).toBe(true);
    const closed = await quality.agent.put(`/api/v1/audits/${audit.id}/items/${audit.items[0].id}`).send({ handCount: 1 });
    expect(closed.status).toBe(422);

    const report = await quality.agent.get(`/api/v1/reports/accuracy?from=${from}&to=${today}&by=part`);
    const row = report.body.rows.find((r: { key: string }) => r.key === String(part.id));
    expect(row).toMatchObject({ recounts: 5, nonconforming: 1, errorRate: 0.2, exactFlagged: 5, exactRight: 4, exactRightShare: 0.8 });
  });

  it('exports the accuracy report as CSV with formula-looking names neutralised', async () => {
    const quality = await signedIn('quality');
    const sneaky = await createUser('operator', { name: '=HYPERLINK("http://x")' });
    const part = await createPart();
    const scale = await createScale();
    const request = (await import('supertest')).default;
    const { baseUrl } = await import('../helpers/http');
    const op = request.agent(baseUrl());
    await op.post('/api/v1/session').send({ email: sneaky.email, password: 'correct horse battery' });
    for (let i = 0; i < 2; i++) {
      await op
        .post('/api/v1/counts')
        .set('Idempotency-Key', randomUUID())
        .send({ purpose: 'part', partId: part.id, scaleId: scale.id, gross: 60, tare: 0, sample: { quantity: 10, netWeight: 6 }, stable: true });
    }
    const [from, today] = [utcDay(-1), utcDay()];
    const audit = (await quality.agent.post('/api/v1/audits').send({ population: { from, to: today, partId: part.id }, aql: 6.5 })).body.audit;
    for (const item of audit.items) await quality.agent.put(`/api/v1/audits/${audit.id}/items/${item.id}`).send({ handCount: item.count });
    const csv = await quality.agent.get(`/api/v1/reports/accuracy?from=${from}&to=${today}&by=operator&format=csv`);
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    expect(csv.headers['content-disposition']).toMatch(/attachment; filename="accuracy-by-operator/);
    expect(csv.text).toContain(`"'=HYPERLINK(""http://x"")"`);
    expect(csv.text).not.toMatch(/^"?=HYPERLINK/m);
  });
});
