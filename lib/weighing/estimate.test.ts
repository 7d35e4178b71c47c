import { describe, expect, it } from 'vitest';
import { estimateCount, type EstimateCountInput } from './estimate';
import { PLANNED_STANDARD_UNCERTAINTY } from './exact-reach';

// The contract's example request. Hand-worked with docs/counting-model.md (first-order propagation,
// JCGM 100:2008 5.1.2 and 5.2.2): s_r = d/2 blurs the rounding phase (β = π², the dependent-rounding
// terms are below 1e-5 of d²), so u(W)² = 2(d²/12 + s_r²) = 6.667e-5 g², M = N̂ − n = 985.93,
// m = M/n = 39.437: pieces c²(M + M²/n) = 15.947; weighing u(W)²(1 + m + m²)/APW² = 0.3007;
// u = √16.248 = 4.0309, U = 2u + half the step one division of the sample moves N̂ by,
// (N̂/n)·d/APW = 0.6798: 8.0617 + 0.3399 = 8.4016.
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
      standardUncertainty: 4.04, // 4.0309 rounded up
      expandedUncertainty: 8.41, // 8.4016 rounded up
      coverageFactor: 2.08,
      exact: false,
      // ≈ φ(0.07/4.03)/4.03 = 0.0990: the chance of one whole count under a normal this wide
      probabilityExact: expect.closeTo(0.099, 3),
      wholePieceRange: 8,
      // 1.63015e-5·M² + 4.07538e-4·M + 1.8844e-4 = u_plan² (0.19631²) → M = 37.59 → 25 + 37
      maxExactQuantity: 62,
      recommendedSampleQuantity: expect.any(Number),
      pieceSpread: { value: 0.02, source: 'given', degreesOfFreedom: null },
      warnings: [
        { code: 'count_not_exact', message: expect.any(String) },
        { code: 'sample_too_small', message: expect.any(String) },
      ],
    });
    expect(PLANNED_STANDARD_UNCERTAINTY).toBeCloseTo(0.19631, 4);
  });

  it('recommends the smallest sample that puts the target within exact reach', () => {
    const n = estimateCount(request).recommendedSampleQuantity!;
    const at = (quantity: number) => estimateCount({ ...request, sample: { quantity, netWeight: quantity * 0.5948 }, netWeight: 1000 * 0.5948 });
    expect(at(n).maxExactQuantity).toBeGreaterThanOrEqual(1000);
    expect(at(n - 1).maxExactQuantity).toBeLessThan(1000);
    expect(at(n).exact).toBe(true);
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
    expect(r.expandedUncertainty).toBe(8.41);
  });

  it('defaults to the sample on the pan and no repeatability', () => {
    const { sampleOnPan: _ignored, ...rest } = request;
    expect(estimateCount(rest).count).toBe(estimateCount(request).count);
    const noSr = estimateCount({ ...request, scale: { division: 0.01 } });
    const zeroSr = estimateCount({ ...request, scale: { division: 0.01, repeatability: 0 } });
    expect(noSr).toEqual(zeroSr);
  });

  it('assumes a cautious 5 % when no spread is known, and says so; the site may set its own', () => {
    const { pieceSpread: _ignored, ...rest } = request;
    const r = estimateCount(rest);
    expect(r.warnings.map((w) => w.code)).toContain('cv_assumed');
    expect(r.pieceSpread).toEqual({ value: 0.05, source: 'assumed', degreesOfFreedom: null });
    expect(r.expandedUncertainty).toBeGreaterThan(estimateCount(request).expandedUncertainty);
    expect(estimateCount(rest, { defaultPieceSpread: 0.08 }).expandedUncertainty).toBeGreaterThan(r.expandedUncertainty);
  });

  it('learns the spread from single-piece increments, and is less sure with fewer of them', () => {
    const pieces = [0.5931, 0.6012, 0.5874, 0.5969, 0.5908, 0.6003, 0.5951, 0.5889, 0.5977, 0.5942];
    const { pieceSpread: _ignored, ...rest } = request;
    const five = estimateCount({ ...rest, sample: { ...rest.sample, increments: pieces.slice(0, 5) }, netWeight: 14.87 + 0.5948 * 20 });
    const ten = estimateCount({ ...rest, sample: { ...rest.sample, increments: pieces }, netWeight: 14.87 + 0.5948 * 20 });
    expect(five.pieceSpread.source).toBe('learned');
    expect(five.pieceSpread.degreesOfFreedom).toBe(4);
    expect(ten.pieceSpread.degreesOfFreedom).toBe(9);
    expect(ten.maxExactQuantity).toBeGreaterThan(five.maxExactQuantity);
    expect(five.warnings.map((w) => w.code)).not.toContain('cv_assumed');
  });

  it('takes a given spread with its degrees of freedom as less sure than a well-known one', () => {
    const withDof = estimateCount({ ...request, pieceSpreadDegreesOfFreedom: 4 });
    expect(withDof.expandedUncertainty).toBeGreaterThan(estimateCount(request).expandedUncertainty);
    expect(withDof.coverageFactor).toBeGreaterThan(2);
    expect(withDof.pieceSpread).toEqual({ value: 0.02, source: 'given', degreesOfFreedom: 4 });
  });

  it('reports an exact count without the not-exact warning, and its ± range as 0', () => {
    const r = estimateCount({ ...request, netWeight: 14.87 + 0.5948 * 30, targetQuantity: undefined });
    expect(r.count).toBe(55);
    expect(r.exact).toBe(true);
    expect(r.wholePieceRange).toBe(0);
    expect(r.probabilityExact).toBeGreaterThanOrEqual(0.99);
    expect(r.recommendedSampleQuantity).toBeNull();
    expect(r.warnings).toEqual([]);
  });

  it('never calls a reading half-way between two counts exact, and says it fits no whole count', () => {
    const base = {
      ...request,
      scale: { division: 0.001 },
      sample: { quantity: 100, netWeight: 200 },
      pieceSpread: 0,
      targetQuantity: undefined,
      sampleOnPan: false,
    };
    const half = estimateCount({ ...base, netWeight: 25 });
    expect(half.countRaw).toBe(12.5);
    expect(half.exact).toBe(false);
    expect(half.probabilityExact).toBeLessThan(0.99);
    expect(half.warnings.map((w) => w.code)).toContain('not_whole_pieces');
    const whole = estimateCount({ ...base, netWeight: 26 });
    expect(whole.exact).toBe(true);
    expect(whole.warnings.map((w) => w.code)).not.toContain('not_whole_pieces');
  });

  it('flags pieces lighter than one division, pieces too light to count even one, and loads outside Min and Max', () => {
    const light = estimateCount({ ...request, sample: { quantity: 10, netWeight: 0.05 }, netWeight: 0.1 });
    expect(light.warnings.map((w) => w.code)).toEqual(expect.arrayContaining(['apw_below_resolution', 'below_min_capacity', 'single_piece_not_resolved']));
    expect(light.maxExactQuantity).toBe(0);
    // 1.5 d a piece: above the division, yet no single piece is told apart from the noise
    const close = estimateCount({ ...request, scale: { division: 0.01, repeatability: 0.005 }, sample: { quantity: 10, netWeight: 0.15 }, netWeight: 0.3 });
    expect(close.warnings.map((w) => w.code)).toContain('single_piece_not_resolved');
    expect(close.warnings.map((w) => w.code)).not.toContain('apw_below_resolution');
    const heavy = estimateCount({ ...request, netWeight: 6000.5 });
    expect(heavy.warnings.map((w) => w.code)).toContain('over_capacity');
  });

  it('checks capacity on the gross: the container counts too', () => {
    const load = { ...request, netWeight: 5800 };
    expect(estimateCount(load).warnings.map((w) => w.code)).not.toContain('over_capacity');
    expect(estimateCount({ ...load, tare: 250 }).warnings.map((w) => w.code)).toContain('over_capacity');
  });

  it('does not ask for a larger sample when the target is already below the sample on the pan', () => {
    const r = estimateCount({ ...request, targetQuantity: 20, netWeight: 14.87 });
    expect(r.warnings.map((w) => w.code)).not.toContain('sample_too_small');
    expect(r.recommendedSampleQuantity).toBeNull();
  });

  it('counts a bulk weighed apart with all of its pieces uncertain', () => {
    const apart = estimateCount({ ...request, sampleOnPan: false });
    expect(apart.countRaw).toBe(1010.93);
    // c²(N + N²/n) = 16.756 and (2R₀ + 2Q)(1 + r²)/APW² = 0.3083 → u = 4.1309
    expect(apart.standardUncertainty).toBe(4.14);
    // 1.63015e-5·N² + 4e-4·N + 1.8844e-4 = u_plan² → N = 37.8
    expect(apart.maxExactQuantity).toBe(37);
    expect(apart.recommendedSampleQuantity).toBeNull();
  });

  it("counts a bulk on a second scale with both scales' calibration, which one scale would cancel", () => {
    const fine = { division: 0.001, repeatability: 0.0005, calibrationUncertainty: 0.002 };
    const platform = { division: 0.1, repeatability: 0.05, calibrationUncertainty: 0.5 };
    const two = estimateCount({ ...request, scale: fine, bulkScale: platform, sampleOnPan: false, targetQuantity: undefined });
    const noCalibration = estimateCount({
      ...request,
      scale: { ...fine, calibrationUncertainty: 0 },
      bulkScale: { ...platform, calibrationUncertainty: 0 },
      sampleOnPan: false,
      targetQuantity: undefined,
    });
    expect(two.count).toBe(1011);
    expect(two.standardUncertainty).toBeGreaterThan(noCalibration.standardUncertainty);
    expect(() => estimateCount({ ...request, bulkScale: platform, sampleOnPan: true })).toThrow(/sampleOnPan/);
  });

  it('refuses input out of range with a RangeError naming the field', () => {
    expect(() => estimateCount({ ...request, scale: { division: 0 } })).toThrow(/scale\.division/);
    expect(() => estimateCount({ ...request, sample: { quantity: 2.5, netWeight: 1 } })).toThrow(/sample\.quantity/);
    expect(() => estimateCount({ ...request, sample: { quantity: 2, netWeight: 0 } })).toThrow(/sample\.netWeight/);
    expect(() => estimateCount({ ...request, sample: { quantity: 2, netWeight: 5e-324 } })).toThrow(/sample\.netWeight/);
    expect(() => estimateCount({ ...request, netWeight: -1 })).toThrow(RangeError);
    expect(() => estimateCount({ ...request, pieceSpread: 1.5 })).toThrow(/pieceSpread/);
    expect(() => estimateCount({ ...request, pieceSpread: undefined, pieceSpreadDegreesOfFreedom: 3 })).toThrow(/pieceSpreadDegreesOfFreedom/);
    expect(() => estimateCount({ ...request, sample: { ...request.sample, increments: [0.6] } })).toThrow(/sample\.increments/);
    expect(() => estimateCount({ ...request, targetQuantity: 0 })).toThrow(/targetQuantity/);
    expect(() => estimateCount({ ...request, unit: 'stone' as never })).toThrow(/unit/);
  });
});
