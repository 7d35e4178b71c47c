import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { signedIn, type Agent } from '../helpers/http';

async function estimate(agent: Agent, body: unknown) {
  return agent.post('/api/v1/counting/estimate').send(body as object);
}

describe('POST /api/v1/counting/estimate', () => {
  it('answers the contract shape for the documented request', async () => {
    const { agent } = await signedIn('operator');
    const res = await estimate(agent, {
      unit: 'g',
      scale: { division: 0.01, repeatability: 0.005, max: 6000, min: 0.2 },
      sample: { quantity: 25, netWeight: 14.87 },
      netWeight: 601.3,
      sampleOnPan: true,
      pieceSpread: 0.02,
      targetQuantity: 1000,
    });
    expect(res.status).toBe(200);
    expect(Object.keys(res.body).sort()).toEqual(
      ['averagePieceWeight', 'count', 'countRaw', 'coverageFactor', 'exact', 'expandedUncertainty', 'maxExactQuantity', 'recommendedSampleQuantity', 'standardUncertainty', 'warnings'].sort(),
    );
    expect(res.body.averagePieceWeight).toBeCloseTo(14.87 / 25, 6);
    expect(res.body.count).toBe(1011);
    expect(res.body.coverageFactor).toBe(2);
    expect(res.body.exact).toBe(false);
    expect(res.body.warnings.map((w: { code: string }) => w.code)).toEqual(expect.arrayContaining(['count_not_exact', 'sample_too_small']));
    expect(res.body.warnings.every((w: { message: string }) => w.message.length > 10)).toBe(true);
  });

  // Hand-worked with JCGM 100:2008 (GUM) 5.1.2 and F.2.2.1, bulk weighed apart, c = 0:
  // u(W)² = 2·d²/12 = 0.0016667 g²; u_r(APW)² = u(W)²/W_s² = 4.1667e-6;
  // u(N)² = M²·u_r² + u(W)²/APW² = 0.041667 + 0.000417 → u = 0.2051, U = 0.4103 → exact.
  it('matches a hand-worked GUM example, and gives the same count in kg, lb and oz', async () => {
    const { agent } = await signedIn('planner');
    const base = { scale: { division: 0.1, repeatability: 0 }, sample: { quantity: 10, netWeight: 20 }, netWeight: 200, sampleOnPan: false, pieceSpread: 0 };
    const grams = await estimate(agent, { unit: 'g', ...base });
    expect(grams.status).toBe(200);
    expect(grams.body).toMatchObject({ count: 100, countRaw: 100, standardUncertainty: 0.21, expandedUncertainty: 0.42, exact: true });
    expect(grams.body.warnings).toEqual([]);
    // NIST SP 811 exact factors: 1 lb = 453.592 37 g, 1 oz = 28.349 523 125 g.
    for (const [unit, perGram] of [['kg', 1 / 1000], ['lb', 1 / 453.59237], ['oz', 1 / 28.349523125]] as const) {
      const scaled = {
        unit,
        scale: { division: 0.1 * perGram, repeatability: 0 },
        sample: { quantity: 10, netWeight: 20 * perGram },
        netWeight: 200 * perGram,
        sampleOnPan: false,
        pieceSpread: 0,
      };
      const res = await estimate(agent, scaled);
      expect(res.status, unit).toBe(200);
      expect(res.body.count).toBe(100);
      // the response gives APW to 6 significant digits
      expect(Math.abs(res.body.averagePieceWeight / (2 * perGram) - 1)).toBeLessThan(5e-6);
      expect(res.body.expandedUncertainty).toBe(0.42);
    }
  });

  it('flags the assumed spread when none is given, and a part too light to resolve', async () => {
    const { agent } = await signedIn('clerk');
    const res = await estimate(agent, { unit: 'g', scale: { division: 0.1 }, sample: { quantity: 10, netWeight: 0.5 }, netWeight: 5 });
    expect(res.status).toBe(200);
    const codes = res.body.warnings.map((w: { code: string }) => w.code);
    expect(codes).toContain('cv_assumed');
    expect(codes).toContain('apw_below_resolution');
    expect(res.body.maxExactQuantity).toBe(0);
  });

  it.each([
    ['zero sample weight', { sample: { quantity: 10, netWeight: 0 } }, 'sample.netWeight'],
    ['negative net weight', { netWeight: -3 }, 'netWeight'],
    ['a string weight', { netWeight: '601.3' }, 'netWeight'],
    ['an unknown unit', { unit: 'stone' }, 'unit'],
    ['a zero division', { scale: { division: 0 } }, 'scale.division'],
    ['a fractional quantity', { sample: { quantity: 2.5, netWeight: 3 } }, 'sample.quantity'],
    ['a spread of 1 or more', { pieceSpread: 1.2 }, 'pieceSpread'],
  ])('rejects %s with 400 and a field message', async (_label, patch, field) => {
    const { agent } = await signedIn('quality');
    const body = { unit: 'g', scale: { division: 0.01 }, sample: { quantity: 25, netWeight: 14.87 }, netWeight: 601.3, ...patch };
    const res = await estimate(agent, body);
    expect(res.status).toBe(400);
    expect(res.body.error.fields[field]).toBeTruthy();
  });

  it('never answers 500 to random and hostile bodies (fast-check)', async () => {
    const { agent } = await signedIn('operator');
    const num = fc.oneof(fc.double({ noNaN: false }), fc.integer(), fc.constant(0), fc.constant(-1), fc.string(), fc.constant(null));
    const body = fc.oneof(
      fc.anything(),
      fc.record(
        {
          unit: fc.oneof(fc.constantFrom('g', 'kg', 'lb', 'oz'), fc.string()),
          scale: fc.record({ division: num, repeatability: num, max: num, min: num }, { requiredKeys: [] }),
          sample: fc.record({ quantity: num, netWeight: num }, { requiredKeys: [] }),
          netWeight: num,
          sampleOnPan: fc.oneof(fc.boolean(), fc.string()),
          pieceSpread: num,
          targetQuantity: num,
        },
        { requiredKeys: [] },
      ),
    );
    await fc.assert(
      fc.asyncProperty(body, async (b) => {
        const res = await agent.post('/api/v1/counting/estimate').set('Content-Type', 'application/json').send(JSON.stringify(b) ?? 'null');
        expect([200, 400]).toContain(res.status);
        if (res.status === 400) expect(res.body.error.code).toMatch(/validation_failed|invalid_json/);
        else expect(Number.isFinite(res.body.count)).toBe(true);
      }),
      { numRuns: 150, seed: 20261202 },
    );
  });
});
