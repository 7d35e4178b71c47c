import { describe, expect, it } from 'vitest';
import { gs1CheckDigit, isValidGtin, toGtin14 } from './gs1-check-digit';

describe('GS1 check digit (GS1 General Specifications §7.9.1)', () => {
  it('matches the published worked example: 629104150021 → 3', () => {
    expect(gs1CheckDigit('629104150021')).toBe(3);
    expect(isValidGtin('6291041500213')).toBe(true);
  });

  it('gives 0 when the weighted sum is already a multiple of ten', () => {
    // 3×1 + 1×7 = 10
    expect(gs1CheckDigit('71')).toBe(0);
  });

  it('weights from the right, so leading zeros do not change the check digit', () => {
    expect(gs1CheckDigit('0629104150021')).toBe(3);
    expect(toGtin14('6291041500213')).toBe('06291041500213');
  });

  it('rejects a GTIN whose last digit is not its check digit, and non-digits', () => {
    expect(isValidGtin('6291041500212')).toBe(false);
    expect(isValidGtin('62910415002A3')).toBe(false);
    expect(() => toGtin14('6291041500212')).toThrow(RangeError);
    expect(() => gs1CheckDigit('12a')).toThrow(RangeError);
  });
});
