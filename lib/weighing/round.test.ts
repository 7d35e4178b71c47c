import { describe, expect, it } from 'vitest';
import { countDecimals, roundDecimals, roundSignificant, roundToStep, roundUpDecimals } from './round';

describe('round', () => {
  it('counts the decimals of a division', () => {
    expect(countDecimals(1)).toBe(0);
    expect(countDecimals(0.1)).toBe(1);
    expect(countDecimals(0.01)).toBe(2);
    expect(countDecimals(0.005)).toBe(3);
    expect(countDecimals(0.0002)).toBe(4);
  });

  it('rounds to a whole number of divisions without binary noise', () => {
    expect(roundToStep(0.1 + 0.2, 0.1)).toBe(0.3);
    expect(roundToStep(12.3449, 0.01)).toBe(12.34);
    expect(roundToStep(12.346, 0.005)).toBe(12.345);
    expect(roundToStep(17, 5)).toBe(15);
  });

  it('rounds uncertainties up, not to nearest, without adding a step to exact values', () => {
    expect(roundUpDecimals(4.021, 2)).toBe(4.03);
    expect(roundUpDecimals(0.3, 2)).toBe(0.3);
    expect(roundUpDecimals(0.4999, 2)).toBe(0.5);
  });

  it('rounds to decimals and to significant digits', () => {
    expect(roundDecimals(1010.928, 2)).toBe(1010.93);
    expect(roundSignificant(0.594812345, 6)).toBe(0.594812);
    expect(roundSignificant(0, 6)).toBe(0);
  });
});
