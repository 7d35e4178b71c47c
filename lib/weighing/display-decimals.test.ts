import { describe, expect, it } from 'vitest';
import { displayDecimals, formatWeight } from './display-decimals';

describe('displayDecimals', () => {
  // Division forms 1, 2, 5 × 10^k (OIML R 76-1 3.4.2, NIST HB 44 2.20 S.1.2; clause numbers from memory).
  it.each([
    [0.0001, 4],
    [0.001, 3],
    [0.002, 3],
    [0.005, 3],
    [0.01, 2],
    [0.02, 2],
    [0.05, 2],
    [0.1, 1],
    [0.2, 1],
    [0.5, 1],
    [1, 0],
    [2, 0],
    [5, 0],
    [10, 0],
  ])('d = %s g shows %i decimals', (d, decimals) => {
    expect(displayDecimals(d)).toBe(decimals);
  });

  it('is not fooled by binary floating point (0.1 + 0.2 = 0.30000000000000004)', () => {
    expect(displayDecimals(0.1 + 0.2)).toBe(1);
    expect(displayDecimals(0.005 * 3)).toBe(3);
  });

  it('refuses a division that is not a positive number', () => {
    for (const d of [0, -0.1, Number.NaN, Number.POSITIVE_INFINITY]) expect(() => displayDecimals(d)).toThrow(RangeError);
  });

  it('formats to the division: 12.3456 g on a 0.01 g scale reads 12.35', () => {
    expect(formatWeight(12.3456, 0.01)).toBe('12.35');
    expect(formatWeight(0, 0.001)).toBe('0.000');
    expect(formatWeight(1234.4, 2)).toBe('1234');
  });

  it('never shows a negative zero', () => {
    expect(formatWeight(-0.0004, 0.001)).toBe('0.000');
    expect(formatWeight(-0, 1)).toBe('0');
    expect(formatWeight(-0.0006, 0.001)).toBe('-0.001');
  });
});
