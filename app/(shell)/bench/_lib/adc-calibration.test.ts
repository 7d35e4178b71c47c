import { describe, expect, it } from 'vitest';
import { calibrate, effectiveDivisionOf, parseCalibration, zeroFrom } from './adc-calibration';

describe('raw ADC calibration', () => {
  it('takes zero and slope from an empty pan and a reference mass (docs/counting-model.md, "Stability and raw load-cell input")', () => {
    const setup = { reversedExcitation: false, averaging: 1 };
    const zero = zeroFrom([1000, 1002, 998], setup);
    const cal = calibrate(zero, [6000, 6000], 500, setup);
    expect(cal).toEqual({ zero: 1000, slope: 10 });
    expect(effectiveDivisionOf(cal, setup)).toBeCloseTo(0.1, 12);
  });

  it('cancels the amplifier offset with reversed excitation pairs', () => {
    const setup = { reversedExcitation: true, averaging: 1 };
    // offset 300 on every reading; signal +50 / −50 alternating
    expect(zeroFrom([350, 250, 350, 250], setup)).toBe(50);
    expect(effectiveDivisionOf({ zero: 0, slope: 10 }, setup)).toBeCloseTo(0.1 / Math.SQRT2, 12);
  });

  it('refuses a saved calibration without a usable slope', () => {
    expect(parseCalibration('{"zero":1,"slope":0}')).toBeNull();
    expect(parseCalibration('{"zero":1,"slope":2}')).toEqual({ zero: 1, slope: 2 });
  });
});
