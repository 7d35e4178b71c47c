import { describe, expect, it } from 'vitest';
import { SimulatedScale, type SimulatedScaleOptions } from './simulator';

const base: SimulatedScaleOptions = {
  seed: 1,
  capacity: 6000,
  division: 0.01,
  repeatability: 0.005,
  settleMs: 200,
  part: { meanWeight: 0.6, spread: 0.02 },
};

describe('SimulatedScale', () => {
  it('gives the same readings for the same seed and script', () => {
    const run = () => {
      const scale = new SimulatedScale(base);
      scale.addPieces(25);
      return scale.tick(3000).map((r) => r.gross);
    };
    expect(run()).toEqual(run());
  });

  it('emits readings at its rate, each a whole number of divisions', () => {
    const scale = new SimulatedScale({ ...base, rateHz: 50 });
    scale.addPieces(10);
    const readings = scale.tick(1000);
    expect(readings).toHaveLength(50);
    expect(readings[1].t - readings[0].t).toBeCloseTo(20, 9);
    for (const r of readings) expect(Math.abs(r.gross / 0.01 - Math.round(r.gross / 0.01))).toBeLessThan(1e-6);
  });

  it('approaches a new load with a first-order lag: 63 % after one time constant', () => {
    const scale = new SimulatedScale({ ...base, repeatability: 0, division: 0.001, part: { meanWeight: 100, spread: 0 } });
    scale.addPieces(10); // 1000 g
    scale.advance(200);
    expect(scale.readNow().gross).toBeCloseTo(1000 * (1 - Math.exp(-1)), 2);
    scale.advance(4000);
    expect(scale.readNow().gross).toBeCloseTo(1000, 3);
  });

  it('scatters readings by the repeatability it was given', () => {
    const scale = new SimulatedScale({ ...base, division: 0.0001, repeatability: 0.005 });
    scale.advance(1000);
    const xs = scale.tick(200000).map((r) => r.gross); // 2000 readings at 10 Hz
    const mean = xs.reduce((a, b) => a + b, 0) / xs.length;
    const sd = Math.sqrt(xs.reduce((a, b) => a + (b - mean) ** 2, 0) / (xs.length - 1));
    // The sd of an sd from 2000 readings is about 1.6 %; 8 % is 5 of those.
    expect(sd).toBeGreaterThan(0.005 * 0.92);
    expect(sd).toBeLessThan(0.005 * 1.08);
  });

  it('draws each piece once, with the part’s mean and spread', () => {
    const scale = new SimulatedScale({ ...base, part: { meanWeight: 2, spread: 0.05 } });
    const weights = scale.addPieces(2000);
    const mean = weights.reduce((a, b) => a + b, 0) / weights.length;
    const sd = Math.sqrt(weights.reduce((a, b) => a + (b - mean) ** 2, 0) / (weights.length - 1));
    expect(mean).toBeCloseTo(2, 1);
    expect(sd / mean).toBeGreaterThan(0.046);
    expect(sd / mean).toBeLessThan(0.054);
    const removed = scale.removePieces(500);
    expect(removed).toEqual(weights.slice(1500));
    expect(scale.pieceCount()).toBe(1500);
    expect(scale.trueLoad()).toBeCloseTo(
      weights.slice(0, 1500).reduce((a, b) => a + b, 0),
      9,
    );
  });

  it('shows a container and takes it away again', () => {
    const scale = new SimulatedScale({ ...base, repeatability: 0 });
    scale.placeContainer(120.5);
    scale.advance(5000);
    expect(scale.readNow().gross).toBe(120.5);
    scale.removeContainer();
    scale.advance(5000);
    expect(scale.readNow().gross).toBe(0);
  });

  it('drifts slowly and returns to zero when zeroed', () => {
    const scale = new SimulatedScale({ ...base, repeatability: 0, driftPerMinute: 0.06 });
    scale.advance(60000);
    expect(scale.readNow().gross).toBeCloseTo(0.06, 9);
    scale.zero();
    expect(scale.readNow().gross).toBe(0);
  });

  it('flags its own readings stable once the lag has closed, when asked to', () => {
    const scale = new SimulatedScale({ ...base, reportStable: true });
    scale.addPieces(100);
    expect(scale.tick(100)[0].stable).toBe(false);
    scale.advance(3000);
    expect(scale.readNow().stable).toBe(true);
    expect(new SimulatedScale(base).readNow().stable).toBeUndefined();
  });

  it('refuses to add pieces when no part is set', () => {
    const scale = new SimulatedScale({ ...base, part: undefined });
    expect(() => scale.addPieces(1)).toThrow(/no part/);
    scale.setPart({ meanWeight: 5, spread: 0 });
    expect(scale.addPieces(2)).toEqual([5, 5]);
  });

  it('holds its indication at Max + 9 d when overloaded and never calls that stable', () => {
    const scale = new SimulatedScale({ ...base, capacity: 100, division: 0.1, reportStable: true, part: { meanWeight: 60, spread: 0 } });
    scale.addPieces(2);
    scale.advance(5000);
    expect(scale.readNow()).toMatchObject({ gross: 100.9, stable: false });
    scale.removePieces(1);
    scale.advance(5000);
    expect(scale.readNow()).toMatchObject({ gross: 60, stable: true });
  });
});
