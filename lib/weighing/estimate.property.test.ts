import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { estimateCount, type EstimateCountInput } from './estimate';
import { WEIGHT_UNITS } from './units';

// Inputs inside the ranges assertEstimateInput accepts, spread over many orders of magnitude.
const validInput: fc.Arbitrary<EstimateCountInput> = fc.record(
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
      netWeight: fc.double({ min: 1e-6, max: 1e6, noNaN: true }),
    }),
    netWeight: fc.double({ min: 0, max: 1e6, noNaN: true }),
    sampleOnPan: fc.boolean(),
    pieceSpread: fc.double({ min: 0, max: 0.99, noNaN: true }),
    targetQuantity: fc.integer({ min: 1, max: 1_000_000 }),
  },
  { requiredKeys: ['unit', 'scale', 'sample', 'netWeight'] },
);

describe('estimateCount properties', () => {
  it('never throws on valid inputs and returns only finite numbers', () => {
    fc.assert(
      fc.property(validInput, (input) => {
        const r = estimateCount(input);
        for (const value of [r.averagePieceWeight, r.countRaw, r.count, r.standardUncertainty, r.expandedUncertainty, r.maxExactQuantity]) {
          expect(Number.isFinite(value)).toBe(true);
        }
        expect(r.recommendedSampleQuantity === null || Number.isInteger(r.recommendedSampleQuantity)).toBe(true);
        expect(Number.isInteger(r.count) && Number.isInteger(r.maxExactQuantity)).toBe(true);
      }),
      { numRuns: 500, seed: 424242 },
    );
  });

  it('keeps exact, U and the not-exact warning consistent with one another', () => {
    fc.assert(
      fc.property(validInput, (input) => {
        const r = estimateCount(input);
        const flagged = r.warnings.some((w) => w.code === 'count_not_exact');
        expect(flagged).toBe(!r.exact);
        if (r.exact) expect(r.expandedUncertainty).toBeLessThanOrEqual(0.5);
        else expect(r.expandedUncertainty).toBeGreaterThanOrEqual(0.5);
        expect(r.expandedUncertainty).toBeGreaterThanOrEqual(r.standardUncertainty);
      }),
      { numRuns: 500, seed: 99 },
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
      }),
      { numRuns: 300, seed: 7 },
    );
  });
});
