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
      [
        'averagePieceWeight',
        'count',
        'countRaw',
        'coverageFactor',
        'exact',
        'expandedUncertainty',
        'maxExactQuantity',
        'pieceSpread',
        'probabilityExact',
        'recommendedSampleQuantity',
        'standardUncertainty',
        'warnings',
        'wholePieceRange',
      ].sort(),
    );
    expect(res.body.averagePieceWeight).toBeCloseTo(14.87 / 25, 6);
    expect(res.body.count).toBe(1011);
    expect(res.body.coverageFactor).toBe(2.08);
    expect(res.body.exact).toBe(false);
    expect(res.body.warnings.map((w: { code: string }) => w.code)).toEqual(expect.arrayContaining(['count_not_exact', 'sample_too_small']));
    expect(res.body.warnings.every((w: { message: string }) => w.message.length > 10)).toBe(true);
  });

  // Hand-worked with JCGM 100:2008 (GUM) 5.1.2 and F.2.2.1, bulk weighed apart, c = 0, s_r = 0: nothing
  // blurs the rounding, so each net is taken at its worst, half a division off the grid: d²/4 = 0.0025 g²
  // (docs/counting-model.md, "Quiet scales"). u(N)² = (d²/4)(1 + r²)/APW², r = 10: 0.063125 → u = 0.2512,
  // 2u = 0.5025, plus half the step one division of the sample moves N̂ by (r·d/APW = 0.5): U = 0.7525;
  // the reading sits on 100, so P(100) = 1/(1 + 2·exp(−1/(2u²))) = 0.99926 → exact.
  it('matches a hand-worked GUM example, and gives the same count in kg, lb and oz', async () => {
    const { agent } = await signedIn('planner');
    const base = { scale: { division: 0.1, repeatability: 0 }, sample: { quantity: 10, netWeight: 20 }, netWeight: 200, sampleOnPan: false, pieceSpread: 0 };
    const grams = await estimate(agent, { unit: 'g', ...base });
    expect(grams.status).toBe(200);
    expect(grams.body).toMatchObject({ count: 100, countRaw: 100, standardUncertainty: 0.26, expandedUncertainty: 0.76, exact: true, wholePieceRange: 0 });
    expect(grams.body.probabilityExact).toBeCloseTo(0.99926, 4);
    expect(grams.body.warnings).toEqual([]);
    // NIST SP 811 exact factors: 1 lb = 453.592 37 g, 1 oz = 28.349 523 125 g.
    for (const [unit, perGram] of [
      ['kg', 1 / 1000],
      ['lb', 1 / 453.59237],
      ['oz', 1 / 28.349523125],
    ] as const) {
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
      expect(res.body.expandedUncertainty).toBe(0.76);
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
    ['a denormal sample weight', { sample: { quantity: 25, netWeight: 5e-324 } }, 'sample.netWeight'],
    ['a sample lighter than one division', { sample: { quantity: 25, netWeight: 0.004 } }, 'sample.netWeight'],
    ['degrees of freedom without a spread', { pieceSpreadDegreesOfFreedom: 4 }, 'pieceSpreadDegreesOfFreedom'],
    ['fractional degrees of freedom', { pieceSpread: 0.02, pieceSpreadDegreesOfFreedom: 2.5 }, 'pieceSpreadDegreesOfFreedom'],
    ['a bulk scale with the sample on the pan', { bulkScale: { division: 1 }, sampleOnPan: true }, 'sampleOnPan'],
    ['a single increment', { sample: { quantity: 25, netWeight: 14.87, increments: [0.59] } }, 'sample.increments'],
    ['a negative tare', { tare: -1 }, 'tare'],
    ['a count beyond a billion pieces', { sample: { quantity: 1, netWeight: 0.01 }, netWeight: 99_000_000 }, 'netWeight'],
  ])('rejects %s with 400 and a field message', async (_label, patch, field) => {
    const { agent } = await signedIn('quality');
    const body = { unit: 'g', scale: { division: 0.01 }, sample: { quantity: 25, netWeight: 14.87 }, netWeight: 601.3, ...patch };
    const res = await estimate(agent, body);
    expect(res.status).toBe(400);
    expect(res.body.error.fields[field]).toBeTruthy();
  });

  it('takes the contract additions: increments, degrees of freedom, a tare and a bulk scale', async () => {
    const { agent } = await signedIn('operator');
    const base = { unit: 'g', scale: { division: 0.001, repeatability: 0.0005, max: 600 }, sample: { quantity: 10, netWeight: 5.948 }, netWeight: 5.948 * 3 };
    const learned = await estimate(agent, {
      ...base,
      sample: { ...base.sample, increments: [0.5931, 0.6012, 0.5874, 0.5969, 0.5908, 0.6003, 0.5951, 0.5889, 0.5977, 0.5942] },
    });
    expect(learned.status).toBe(200);
    expect(learned.body.pieceSpread).toMatchObject({ source: 'learned', degreesOfFreedom: 9 });
    expect(learned.body.warnings.map((w: { code: string }) => w.code)).not.toContain('cv_assumed');
    const given = await estimate(agent, { ...base, pieceSpread: 0.01, pieceSpreadDegreesOfFreedom: 9 });
    expect(given.body.pieceSpread).toEqual({ value: 0.01, source: 'given', degreesOfFreedom: 9 });
    const heavy = await estimate(agent, { ...base, netWeight: 590, tare: 20 });
    expect(heavy.body.warnings.map((w: { code: string }) => w.code)).toContain('over_capacity');
    const platform = await estimate(agent, {
      ...base,
      netWeight: 5948,
      sampleOnPan: false,
      bulkScale: { division: 1, repeatability: 0.5, calibrationUncertainty: 2 },
    });
    expect(platform.status).toBe(200);
    expect(platform.body.count).toBe(10_000);
    expect(platform.body.exact).toBe(false);
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
        const res = await agent
          .post('/api/v1/counting/estimate')
          .set('Content-Type', 'application/json')
          .send(JSON.stringify(b) ?? 'null');
        expect([200, 400]).toContain(res.status);
        if (res.status === 400) expect(res.body.error.code).toMatch(/validation_failed|invalid_json/);
        else expect(Number.isFinite(res.body.count)).toBe(true);
      }),
      { numRuns: 150, seed: 20261202 },
    );
  });
});
