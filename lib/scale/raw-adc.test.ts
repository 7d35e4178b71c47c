import { describe, expect, it } from 'vitest';
import { createRandom } from './prng';
import { adcStepVolts, captureZero, effectiveDivision, pairSignal, pairSignals, rawToGrams, rawToReading, spanCalibration } from './raw-adc';

// An invented front end for the round trip: a 5 kg cell at 2 mV/V on 5 V excitation
// (10 mV at full load), amplifier gain 128, 0.15 V amplifier offset, 10-bit converter over 5 V.
const excitation = 5;
const sensitivity = 0.002; // V/V at capacity
const capacity = 5000; // g
const gain = 128;
const offsetVolts = 0.15;
const step = adcStepVolts(5, 10);

/** Converter counts for a load, with noise in volts at the converter input. */
function convert(grams: number, polarity: 1 | -1, noise = 0): number {
  const bridge = polarity * excitation * sensitivity * (grams / capacity);
  return Math.round((offsetVolts + gain * bridge + noise) / step);
}

describe('raw-adc', () => {
  // 5 V / 2^10 = 4.8828 mV per step (common practice for a 10-bit, 5 V converter).
  it('gives a step of 4.88 mV for a 10-bit converter over 5 V', () => {
    expect(adcStepVolts(5, 10) * 1000).toBeCloseTo(4.8828, 4);
    // At the bridge, in front of a gain of 128: 38.1 µV.
    expect((adcStepVolts(5, 10) / 128) * 1e6).toBeCloseTo(38.147, 3);
  });

  it('cancels the amplifier offset with reversed-excitation pairs', () => {
    expect(pairSignal(100 + 40, 100 - 40)).toBe(40);
    expect(pairSignals([531, 431, 532, 430, 7])).toEqual([50, 51]);
  });

  it('takes the zero as the mean of the empty-pan readings', () => {
    expect(captureZero([31, 31, 32, 30])).toBe(31);
    expect(() => captureZero([])).toThrow(RangeError);
  });

  it('converts back to the applied load within a few effective divisions after a two-point span', () => {
    const random = createRandom(5);
    const noisy = (grams: number) => {
      // 5 mV rms at the converter input (about one step) dithers the rounding, as effectiveDivision assumes.
      const pairs = Array.from({ length: 16 }, () => pairSignal(convert(grams, 1, 0.005 * random.normal()), convert(grams, -1, 0.005 * random.normal())));
      return pairs.reduce((a, b) => a + b, 0) / pairs.length;
    };
    // Zero and span from 16 groups each, so their errors are a quarter of one group's.
    const zero = captureZero(Array.from({ length: 16 }, () => noisy(0)));
    const cal = spanCalibration(zero, captureZero(Array.from({ length: 16 }, () => noisy(2000))), 2000);
    // Signal per gram: gain·excitation·sensitivity/capacity/step = 128·0.01/5000/0.0048828 = 0.05243 counts/g.
    expect(cal.slope).toBeCloseTo(0.05243, 3);
    const d = effectiveDivision(cal.slope, 32); // 16 pairs = 32 readings
    expect(effectiveDivision(cal.slope)).toBeCloseTo(19.07, 1); // one step ≈ 19 g: why bare 10-bit fronts are coarse
    // One reading has sd ≈ d; zero and span add about d/4 each, the span's scaled by load/2000:
    // sd ≤ d·√(1 + (2.45/4)² + (1.45/4)²) ≈ 1.23 d at 4900 g, so 4 d is over 3 sd.
    for (const load of [500, 1234, 3500, 4900]) {
      expect(Math.abs(rawToGrams(noisy(load), cal) - load)).toBeLessThan(d * 4);
    }
  });

  it('refuses a span with no signal', () => {
    expect(() => spanCalibration(10, 10, 1000)).toThrow(RangeError);
  });

  it('wraps a raw sample as a reading rounded to a division', () => {
    const cal = { zero: 100, slope: 2 };
    expect(rawToReading(350, cal, 7, 5)).toEqual({ t: 7, gross: 125, unit: 'g', raw: 350 });
    expect(rawToReading(351, cal, 7).gross).toBe(125.5);
  });
});
