import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Reading } from './reading';
import { SimulatedScale } from './simulator';
import { createSimulatorSource } from './simulator-source';

afterEach(() => {
  vi.useRealTimers();
});

describe('createSimulatorSource', () => {
  it('streams simulated readings on timers at the scale’s rate', async () => {
    vi.useFakeTimers();
    let wall = 0;
    const scale = new SimulatedScale({ seed: 3, capacity: 1000, division: 0.1, rateHz: 10, part: { meanWeight: 2, spread: 0 } });
    const source = createSimulatorSource(scale, { now: () => wall });
    const got: Reading[] = [];
    source.subscribe((r) => got.push(r));
    await source.start();
    scale.addPieces(5);
    for (let i = 0; i < 30; i += 1) {
      wall += 100;
      vi.advanceTimersByTime(100);
    }
    await source.stop();
    expect(source.kind).toBe('simulator');
    expect(got.length).toBe(30);
    expect(got.at(-1)!.gross).toBe(10);
    wall += 1000;
    vi.advanceTimersByTime(1000);
    expect(got.length).toBe(30);
    expect(source.running()).toBe(false);
  });

  it('zeroes the simulated indicator on request', async () => {
    const scale = new SimulatedScale({ seed: 3, capacity: 1000, division: 0.1, part: { meanWeight: 2, spread: 0 } });
    scale.addPieces(5);
    scale.advance(5000);
    await createSimulatorSource(scale).zero!();
    expect(scale.readNow().gross).toBe(0);
  });
});
