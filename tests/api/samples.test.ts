import { describe, expect, it } from 'vitest';
import { Part, PieceWeightSample } from '../../models';
import { createPart, createScale, testDb } from '../helpers/db';
import { signedIn } from '../helpers/http';

// A fine bench scale: d = 0.001 g, Min 0.2 g, Max 600 g.
const fineScale = () => createScale({ divisionG: 0.001, eG: 0.01, capacityG: 600, repeatabilityG: 0.0005 });

async function partFrom(samples: Array<{ quantity: number; netWeight: number }>) {
  const { agent } = await signedIn('operator');
  const part = await createPart();
  const scale = await fineScale();
  for (const s of samples) {
    const res = await agent.post(`/api/v1/parts/${part.id}/samples`).send({ scaleId: scale.id, ...s });
    expect(res.status).toBe(201);
    expect(res.body.held).toBe(false);
  }
  return { agent, part, scale };
}

describe('samples that teach a part', () => {
  it('refuses a sample the scale cannot have weighed, names the field, and leaves the part as it was', async () => {
    const { agent, part, scale } = await partFrom([{ quantity: 20, netWeight: 24.06 }]);
    const before = await Part.findByPk(part.id);
    // 10 000 000 pieces in 0.01 g: 1e-9 g a piece, far below the 0.001 g division
    const poisoned = await agent.post(`/api/v1/parts/${part.id}/samples`).send({ scaleId: scale.id, quantity: 10_000_000, netWeight: 0.01 });
    expect(poisoned.status).toBe(422);
    expect(poisoned.body.error.fields.quantity).toMatch(/less than this scale's division/);
    const over = await agent.post(`/api/v1/parts/${part.id}/samples`).send({ scaleId: scale.id, quantity: 600, netWeight: 720 });
    expect(over.status).toBe(422);
    expect(over.body.error.fields.netWeight).toMatch(/over this scale's Max/);
    const under = await agent.post(`/api/v1/parts/${part.id}/samples`).send({ scaleId: scale.id, quantity: 1, netWeight: 0.1 });
    expect(under.status).toBe(422);
    expect(under.body.error.fields.netWeight).toMatch(/under this scale's Min/);
    const after = await Part.findByPk(part.id);
    expect(after!.apwG).toBe(before!.apwG);
    expect(after!.pieceSpread).toBe(before!.pieceSpread);
    expect(await PieceWeightSample.count({ where: { partId: part.id } })).toBe(1);
  });

  it('holds a sample far from the history: it is kept but moves neither APW nor spread until someone accepts it', async () => {
    const { agent, part, scale } = await partFrom([
      { quantity: 20, netWeight: 24.06 },
      { quantity: 25, netWeight: 30.09 },
      { quantity: 20, netWeight: 24.02 },
    ]);
    const before = (await agent.get(`/api/v1/parts/${part.id}`)).body.part;
    // 1.5 g a piece against a history of 1.203 g: a wrong part, or a miscount
    const far = await agent.post(`/api/v1/parts/${part.id}/samples`).send({ scaleId: scale.id, quantity: 20, netWeight: 30 });
    expect(far.status).toBe(201);
    expect(far.body.held).toBe(true);
    expect(far.body.sample).toMatchObject({ status: 'held', holdReason: expect.stringMatching(/standard deviations from this part's history/) });
    expect(far.body.part.averagePieceWeight).toBe(before.averagePieceWeight);
    expect(far.body.part.pieceSpread).toBe(before.pieceSpread);

    const operator = await agent.post(`/api/v1/parts/${part.id}/samples/${far.body.sample.id}/decision`).send({ decision: 'accept' });
    expect(operator.status).toBe(403);
    const { agent: quality, userId } = await signedIn('quality');
    const accepted = await quality.post(`/api/v1/parts/${part.id}/samples/${far.body.sample.id}/decision`).send({ decision: 'accept' });
    expect(accepted.status).toBe(200);
    expect(accepted.body.sample).toMatchObject({ status: 'accepted', decidedBy: userId });
    expect(accepted.body.part.averagePieceWeight).toBeCloseTo(1.5, 9);
    const again = await quality.post(`/api/v1/parts/${part.id}/samples/${far.body.sample.id}/decision`).send({ decision: 'reject' });
    expect(again.status).toBe(409);
  });

  it('keeps a rejected sample out of everything the part learns', async () => {
    const { agent, part, scale } = await partFrom([
      { quantity: 20, netWeight: 24.06 },
      { quantity: 20, netWeight: 24.1 },
    ]);
    const far = await agent.post(`/api/v1/parts/${part.id}/samples`).send({ scaleId: scale.id, quantity: 20, netWeight: 12 });
    expect(far.body.held).toBe(true);
    const { agent: planner } = await signedIn('planner');
    const rejected = await planner.post(`/api/v1/parts/${part.id}/samples/${far.body.sample.id}/decision`).send({ decision: 'reject' });
    expect(rejected.status).toBe(200);
    expect(rejected.body.part.averagePieceWeight).toBeCloseTo(1.205, 9);
    testDb();
    expect((await PieceWeightSample.findByPk(far.body.sample.id))!.status).toBe('rejected');
    const bad = await planner.post(`/api/v1/parts/${part.id}/samples/${far.body.sample.id}/decision`).send({ decision: 'maybe' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.decision).toBeTruthy();
  });

  it('learns a spread with its degrees of freedom from pieces put on one at a time, pooled over samples', async () => {
    const { agent } = await signedIn('operator');
    const part = await createPart();
    const scale = await fineScale();
    const pieces = [1.2, 1.212, 1.188, 1.2, 1.224, 1.176, 1.2, 1.206, 1.194, 1.2];
    const send = (increments: number[]) =>
      agent
        .post(`/api/v1/parts/${part.id}/samples`)
        .send({ scaleId: scale.id, quantity: increments.length, netWeight: increments.reduce((a, b) => a + b, 0), increments });
    const first = await send(pieces);
    expect(first.status).toBe(201);
    expect(first.body.part).toMatchObject({ spreadLearned: true, spreadDegreesOfFreedom: 9, spreadBelief: { kind: 'learned', degreesOfFreedom: 9 } });
    const second = await send(pieces.slice(0, 6));
    expect(second.body.part.spreadDegreesOfFreedom).toBe(14);
    // A piece that did not move the reading (0) or moved it down is still a reading.
    const quiet = await send([1.2, 0, 2.4, 1.19]);
    expect(quiet.status).toBe(201);
  });
});
