import { describe, expect, it } from 'vitest';
import { createRandom } from '../scale/prng';
import { isWindowStable, StabilityDetector } from './stability';

const d = 0.01;
const period = 20; // 50 Hz

function feed(detector: StabilityDetector, from: number, to: number, value: (t: number) => number) {
  let last = detector.state();
  for (let t = from; t <= to; t += period) last = detector.push({ t, gross: value(t) });
  return last;
}

describe('isWindowStable', () => {
  const quiet = { division: d };
  it('accepts readings all within one division of their mean on a quiet scale', () => {
    expect(isWindowStable([10.0, 10.01, 10.02, 10.01], quiet)).toBe(true);
  });

  it('refuses a window with one reading well away from the mean', () => {
    expect(isWindowStable([10.0, 10.0, 10.0, 10.05], quiet)).toBe(false);
    expect(isWindowStable([], quiet)).toBe(false);
  });

  it('allows a noisy scale its own noise, and more once settled (hysteresis)', () => {
    const noisy = { division: d, repeatability: d / 2 }; // σ = 0.577 d: settle within ±1.73 d, stay within ±2.89 d
    const wander = [10.0, 10.01, 9.99, 10.01, 10.0, 9.99, 10.01, 10.0];
    expect(isWindowStable([...wander, 10.02], quiet)).toBe(false);
    expect(isWindowStable([...wander, 10.015], noisy)).toBe(true);
    const further = [...wander, 10.025];
    expect(isWindowStable(further, noisy)).toBe(false);
    expect(isWindowStable(further, noisy, true)).toBe(true);
  });
});

describe('StabilityDetector', () => {
  it('reports stable only once a still reading has filled the whole window', () => {
    const detector = new StabilityDetector({ division: d });
    expect(feed(detector, 0, 980, () => 25.0).stable).toBe(false);
    const settled = feed(detector, 1000, 1000, () => 25.0);
    expect(settled.stable).toBe(true);
    expect(settled.source).toBe('window');
    expect(settled.mean).toBeCloseTo(25, 12);
  });

  it('drops to unstable on a load change and recovers one window after it settles', () => {
    const detector = new StabilityDetector({ division: d, windowMs: 1000 });
    feed(detector, 0, 2000, () => 10.0);
    expect(detector.push({ t: 2020, gross: 10.5 }).stable).toBe(false);
    expect(feed(detector, 2040, 3000, () => 10.5).stable).toBe(false);
    expect(feed(detector, 3020, 3040, () => 10.5).stable).toBe(true);
  });

  it('trusts the scale’s own stability flag when the window still moves', () => {
    const detector = new StabilityDetector({ division: d });
    const state = detector.push({ t: 0, gross: 3.2, stable: true });
    expect(state.stable).toBe(true);
    expect(state.source).toBe('scale');
  });

  it('returns the window mean of a noisy but still reading for the capture', () => {
    const detector = new StabilityDetector({ division: d });
    const state = feed(detector, 0, 1200, (t) => ((t / period) % 2 === 0 ? 5.0 : 5.01));
    expect(state.stable).toBe(true);
    expect(state.mean).toBeCloseTo(5.005, 3);
  });

  it('starts over when the clock goes backwards', () => {
    const detector = new StabilityDetector({ division: d });
    feed(detector, 0, 2000, () => 1);
    expect(detector.push({ t: 100, gross: 1 }).stable).toBe(false);
  });

  it('agrees with a from-scratch check of the window on two minutes of a random 50 Hz stream', () => {
    const random = createRandom(31337);
    const detector = new StabilityDetector({ division: d, windowMs: 500 });
    const history: { t: number; v: number }[] = [];
    let level = 100;
    let settled = false;
    for (let i = 0; i < 6000; i += 1) {
      const t = i * period;
      if (random.next() < 0.01) level += (random.next() - 0.5) * 0.2;
      const v = Math.round((level + random.normal() * 0.004) / d) * d;
      history.push({ t, v });
      const state = detector.push({ t, gross: v });
      const inWindow = history.filter((h) => h.t >= t - 500).map((h) => h.v);
      const full = t >= 500;
      const mean = inWindow.reduce((a, b) => a + b, 0) / inWindow.length;
      expect(state.mean).toBeCloseTo(mean, 9);
      expect(state.stable).toBe(full && isWindowStable(inWindow, { division: d }, settled));
      settled = state.stable;
      if (history.length > 40) history.shift();
    }
  });

  // The simulator's still pan with noise up to ±1 d (s_r = d/2): before, a ±1 d window flickered.
  it('keeps an idle noisy pan settled for 15 s, and catches a piece put on at once', () => {
    const random = createRandom(4242);
    const detector = new StabilityDetector({ division: d, repeatability: d / 2, windowMs: 1000 });
    const read = (level: number) => Math.round((level + random.normal() * (d / 2)) / d) * d;
    let flips = 0;
    let unsettled = 0;
    let last = false;
    for (let t = 0; t <= 16_000; t += period) {
      const state = detector.push({ t, gross: read(150) });
      if (t >= 1000) {
        if (state.stable !== last) flips += 1;
        if (!state.stable) unsettled += 1;
      }
      last = state.stable;
    }
    expect(unsettled).toBe(0);
    expect(flips).toBeLessThanOrEqual(1); // the first settling
    expect(detector.push({ t: 16_020, gross: read(152.5) }).stable).toBe(false);
  });
});
