import { describe, expect, it } from 'vitest';
import { createRandom } from '../scale/prng';
import { createPartSupply } from '../scale/virtual-parts';
import {
  choosePieceSpread, DEFAULT_PIECE_SPREAD, incrementsFromReadings, spreadFromIncrements, spreadFromSamples,
} from './piece-spread';

describe('spreadFromIncrements', () => {
  // Hand-worked: increments 1.00, 1.02, 0.98, 1.01, 0.99 g: mean 1.00, s² = 10e-4/4 = 2.5e-4 → c = 0.015811.
  it('takes the sample standard deviation of the increments relative to their mean', () => {
    const r = spreadFromIncrements([1.0, 1.02, 0.98, 1.01, 0.99]);
    expect(r.pieceSpread).toBeCloseTo(0.015811, 6);
    expect(r.observations).toBe(5);
    expect(r.enough).toBe(true);
  });

  // Same data, u(W) = 0.01 g: √(2.5e-4 − 1e-4) = 0.012247.
  it('removes the weighing noise of each increment in quadrature', () => {
    expect(spreadFromIncrements([1.0, 1.02, 0.98, 1.01, 0.99], 0.01).pieceSpread).toBeCloseTo(0.012247, 6);
  });

  it('floors the spread at zero when the noise explains all of the scatter, and does not trust it', () => {
    const r = spreadFromIncrements([1.0, 1.02, 0.98, 1.01, 0.99], 0.05);
    expect(r.pieceSpread).toBe(0);
    expect(r.enough).toBe(false);
  });

  // s² = 2.5e-4: with u(W) = 0.0079 g (noise 6.2e-5, a quarter of s²) it is still learned; at 0.0080 g it is not.
  it('learns a spread only where the scatter is more than four times the noise variance', () => {
    expect(spreadFromIncrements([1.0, 1.02, 0.98, 1.01, 0.99], 0.0079).enough).toBe(true);
    expect(spreadFromIncrements([1.0, 1.02, 0.98, 1.01, 0.99], 0.008).enough).toBe(false);
  });

  it('says when there are too few increments to trust', () => {
    expect(spreadFromIncrements([1.0, 1.02, 0.98]).enough).toBe(false);
    expect(spreadFromIncrements([1.0]).enough).toBe(false);
  });

  it('turns cumulative stable readings into one increment per piece', () => {
    expect(incrementsFromReadings([0, 1.5, 3.1, 4.6])).toEqual([1.5, expect.closeTo(1.6, 12), expect.closeTo(1.5, 12)]);
  });

  it('recovers a known spread from 400 simulated pieces within 15 %', () => {
    const supply = createPartSupply({ meanWeight: 2, spread: 0.03 }, createRandom(99));
    const increments = Array.from({ length: 400 }, () => supply.draw());
    // Sampling error of a standard deviation is about 1/√(2·400) = 3.5 %; 15 % is over 4 sd.
    expect(spreadFromIncrements(increments).pieceSpread).toBeGreaterThan(0.03 * 0.85);
    expect(spreadFromIncrements(increments).pieceSpread).toBeLessThan(0.03 * 1.15);
  });
});

describe('spreadFromSamples', () => {
  // Hand-worked: n-weighted mean (10·1.00 + 10·1.02 + 20·0.99)/40 = 1.00;
  // Σ n(x − μ)² = 0 + 0.004 + 0.002 = 0.006; /(3 − 1) = 0.003 → c = √0.003 = 0.054772.
  it('estimates c from the n-weighted scatter of sample APWs', () => {
    const r = spreadFromSamples([
      { quantity: 10, averagePieceWeight: 1.0 },
      { quantity: 10, averagePieceWeight: 1.02 },
      { quantity: 20, averagePieceWeight: 0.99 },
    ]);
    expect(r.pieceSpread).toBeCloseTo(0.054772, 6);
    expect(r.enough).toBe(true);
  });

  it('recovers a known spread from 200 simulated samples of 25 within 20 %', () => {
    const supply = createPartSupply({ meanWeight: 0.6, spread: 0.02 }, createRandom(5));
    const samples = Array.from({ length: 200 }, () => {
      const total = Array.from({ length: 25 }, () => supply.draw()).reduce((a, b) => a + b, 0);
      return { quantity: 25, averagePieceWeight: total / 25 };
    });
    // Sampling error about 1/√(2·199) = 5 %; 20 % is 4 sd.
    const c = spreadFromSamples(samples).pieceSpread;
    expect(c).toBeGreaterThan(0.016);
    expect(c).toBeLessThan(0.024);
  });

  it('says when there are too few samples to trust', () => {
    expect(spreadFromSamples([{ quantity: 10, averagePieceWeight: 1 }, { quantity: 10, averagePieceWeight: 1.1 }]).enough).toBe(false);
  });
});

describe('choosePieceSpread', () => {
  it('falls back to the documented 2 % default and marks it assumed', () => {
    expect(DEFAULT_PIECE_SPREAD).toBe(0.02);
    expect(choosePieceSpread(null)).toEqual({ pieceSpread: 0.02, assumed: true });
    expect(choosePieceSpread({ pieceSpread: 0.01, observations: 2, enough: false }, 0.03)).toEqual({ pieceSpread: 0.03, assumed: true });
  });

  it('uses the learned spread once there are enough observations', () => {
    expect(choosePieceSpread({ pieceSpread: 0.011, observations: 8, enough: true })).toEqual({ pieceSpread: 0.011, assumed: false });
  });
});
