import { describe, expect, it } from 'vitest';
import { estimateCount, type EstimateCountInput } from './estimate';

// The contract's example request; expected values worked by hand in count.test.ts and exact-range.test.ts.
const request: EstimateCountInput = {
  unit: 'g',
  scale: { division: 0.01, repeatability: 0.005, max: 6000, min: 0.2 },
  sample: { quantity: 25, netWeight: 14.87 },
  netWeight: 601.3,
  sampleOnPan: true,
  pieceSpread: 0.02,
  targetQuantity: 1000,
};

describe('estimateCount', () => {
  it('answers the contract example with the hand-worked count and uncertainty', () => {
    const r = estimateCount(request);
    expect(r).toEqual({
      averagePieceWeight: 0.5948,
      countRaw: 1010.93,
      count: 1011,
      standardUncertainty: 4.04, // 4.03087 rounded up (count.test.ts)
      expandedUncertainty: 8.07, // 8.06174 rounded up
      coverageFactor: 2,
      exact: false,
      maxExactQuantity: 75,
      recommendedSampleQuantity: 866,
      warnings: [
        { code: 'count_not_exact', message: expect.any(String) },
        { code: 'sample_too_small', message: expect.any(String) },
      ],
    });
  });

  it('gives the same count for the same load sent in pounds, and answers in pounds', () => {
    const lb = 453.59237;
    const r = estimateCount({
      ...request,
      unit: 'lb',
      scale: { division: 0.01 / lb, repeatability: 0.005 / lb, max: 6000 / lb, min: 0.2 / lb },
      sample: { quantity: 25, netWeight: 14.87 / lb },
      netWeight: 601.3 / lb,
    });
    expect(r.count).toBe(1011);
    expect(r.countRaw).toBe(1010.93);
    expect(r.averagePieceWeight).toBe(Number((0.5948 / lb).toPrecision(6)));
    expect(r.expandedUncertainty).toBe(8.07);
  });

  it('defaults to the sample on the pan and no repeatability', () => {
    const { sampleOnPan: _ignored, ...rest } = request;
    expect(estimateCount(rest).count).toBe(estimateCount(request).count);
    const noSr = estimateCount({ ...request, scale: { division: 0.01 } });
    const zeroSr = estimateCount({ ...request, scale: { division: 0.01, repeatability: 0 } });
    expect(noSr).toEqual(zeroSr);
  });

  it('uses the site default spread when none is sent, and says so', () => {
    const { pieceSpread: _ignored, ...rest } = request;
    const r = estimateCount(rest, { defaultPieceSpread: 0.05 });
    expect(r.warnings.map((w) => w.code)).toContain('cv_assumed');
    expect(r.expandedUncertainty).toBeGreaterThan(estimateCount(request).expandedUncertainty);
    expect(estimateCount(rest).expandedUncertainty).toBe(estimateCount(request).expandedUncertainty); // 2 % default
  });

  it('reports an exact count without the not-exact warning', () => {
    const r = estimateCount({ ...request, netWeight: 14.87 + 0.5948 * 40, targetQuantity: undefined });
    expect(r.count).toBe(65);
    expect(r.exact).toBe(true);
    expect(r.expandedUncertainty).toBeLessThan(0.5);
    expect(r.recommendedSampleQuantity).toBeNull();
    expect(r.warnings).toEqual([]);
  });

  it('flags pieces lighter than one division and loads outside Min and Max', () => {
    const light = estimateCount({ ...request, sample: { quantity: 10, netWeight: 0.05 }, netWeight: 0.1 });
    expect(light.warnings.map((w) => w.code)).toEqual(expect.arrayContaining(['apw_below_resolution', 'below_min_capacity']));
    expect(light.maxExactQuantity).toBe(0);
    const heavy = estimateCount({ ...request, netWeight: 6000.5 });
    expect(heavy.warnings.map((w) => w.code)).toContain('over_capacity');
  });

  it('counts a bulk weighed apart with all of its pieces uncertain', () => {
    const apart = estimateCount({ ...request, sampleOnPan: false });
    expect(apart.countRaw).toBe(1010.93);
    expect(apart.standardUncertainty).toBe(4.14); // 4.13089 rounded up
    expect(apart.maxExactQuantity).toBe(50);
    expect(apart.recommendedSampleQuantity).toBeNull();
  });

  it('refuses input out of range with a RangeError naming the field', () => {
    expect(() => estimateCount({ ...request, scale: { division: 0 } })).toThrow(/scale\.division/);
    expect(() => estimateCount({ ...request, sample: { quantity: 2.5, netWeight: 1 } })).toThrow(/sample\.quantity/);
    expect(() => estimateCount({ ...request, sample: { quantity: 2, netWeight: 0 } })).toThrow(/sample\.netWeight/);
    expect(() => estimateCount({ ...request, netWeight: -1 })).toThrow(RangeError);
    expect(() => estimateCount({ ...request, pieceSpread: 1.5 })).toThrow(/pieceSpread/);
    expect(() => estimateCount({ ...request, targetQuantity: 0 })).toThrow(/targetQuantity/);
    expect(() => estimateCount({ ...request, unit: 'stone' as never })).toThrow(/unit/);
  });
});
