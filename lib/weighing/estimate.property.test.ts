import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { estimateCount, type EstimateCountInput } from './estimate';
import { WEIGHT_UNITS } from './units';

// Inputs inside the ranges assertEstimateInput accepts, spread over many orders of magnitude.
const validInput: fc.Arbitrary<EstimateCountInput> = fc
  .record(
    {
      unit: fc.constantFrom(...WEIGHT_UNITS),
      scale: fc.record(
        {
          division: fc.double({ min: 1e-6, max: 10, noNaN: true }),
          repeatability: fc.double({ min: 0, max: 10, noNaN: true }),
          max: fc.double({ min: 1e-3, max: 1e6, noNaN: true }),
          min: fc.double({ min: 0, max: 100, noNaN: true }),
        },
        { requiredKeys: ['division'] },
      ),
      sample: fc.record({
        quantity: fc.integer({ min: 1, max: 100000 }),
        // in divisions: a sample reads at least one
        netWeight: fc.double({ min: 1, max: 1e6, noNaN: true }),
      }),
      netWeight: fc.double({ min: 0, max: 1e6, noNaN: true }),
      sampleOnPan: fc.boolean(),
      pieceSpread: fc.double({ min: 0, max: 0.99, noNaN: true }),
      targetQuantity: fc.integer({ min: 1, max: 1_000_000 }),
    },
    { requiredKeys: ['unit', 'scale', 'sample', 'netWeight'] },
  )
  .map((input) => {
    const sample = { ...input.sample, netWeight: input.sample.netWeight * input.scale.division };
    // Loads of at most 10^8 pieces: beyond 10^9 the estimate refuses (and a shop never gets near).
    return { ...input, sample, netWeight: Math.min(input.netWeight, 1e8 * (sample.netWeight / sample.quantity)) };
  });

describe('estimateCount properties', () => {
  it('never throws on valid inputs and returns only finite numbers', () => {
    fc.assert(
      fc.property(validInput, (input) => {
        const r = estimateCount(input);
        for (const value of [
          r.averagePieceWeight,
          r.countRaw,
          r.count,
          r.standardUncertainty,
          r.expandedUncertainty,
          r.maxExactQuantity,
          r.probabilityExact,
          r.wholePieceRange,
        ]) {
          expect(Number.isFinite(value)).toBe(true);
        }
        expect(r.recommendedSampleQuantity === null || Number.isInteger(r.recommendedSampleQuantity)).toBe(true);
        expect(Number.isInteger(r.count) && Number.isInteger(r.maxExactQuantity)).toBe(true);
      }),
      { numRuns: 500, seed: 424242 },
    );
  });

  it('keeps exact, its chance, the ± range and the not-exact warning consistent with one another', () => {
    fc.assert(
      fc.property(validInput, (input) => {
        const r = estimateCount(input);
        const flagged = r.warnings.some((w) => w.code === 'count_not_exact');
        expect(flagged).toBe(!r.exact);
        expect(r.probabilityExact).toBeGreaterThanOrEqual(0);
        expect(r.probabilityExact).toBeLessThanOrEqual(1);
        if (r.exact) {
          expect(r.probabilityExact).toBeGreaterThanOrEqual(0.99);
          expect(r.wholePieceRange).toBe(0);
        } else expect(r.wholePieceRange).toBeGreaterThanOrEqual(1);
        expect(r.count).toBe(Math.round(input.netWeight / (input.sample.netWeight / input.sample.quantity)));
      }),
      { numRuns: 500, seed: 99 },
    );
  });

  it('never calls a reading half-way between two whole counts exact', () => {
    fc.assert(
      fc.property(validInput, fc.integer({ min: 0, max: 100000 }), (input, k) => {
        const apw = input.sample.netWeight / input.sample.quantity;
        const r = estimateCount({ ...input, netWeight: (k + 0.5) * apw });
        expect(r.exact).toBe(false);
      }),
      { numRuns: 300, seed: 5 },
    );
  });

  it('never recommends a sample that leaves the target inexact', () => {
    fc.assert(
      fc.property(validInput, (input) => {
        const r = estimateCount(input);
        const n = r.recommendedSampleQuantity;
        if (n === null || input.targetQuantity === undefined) return;
        const apw = input.sample.netWeight / input.sample.quantity;
        const check = estimateCount({ ...input, sample: { quantity: n, netWeight: n * apw }, netWeight: input.targetQuantity * apw });
        expect(check.exact).toBe(true);
        expect(check.maxExactQuantity).toBeGreaterThanOrEqual(input.targetQuantity);
      }),
      { numRuns: 300, seed: 7 },
    );
  });
});
