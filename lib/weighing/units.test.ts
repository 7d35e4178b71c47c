import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { convertWeight, fromGrams, GRAMS_PER_UNIT, isWeightUnit, toGrams, WEIGHT_UNITS } from './units';

describe('units', () => {
  // NIST SP 811 (2008) App. B.8 and NIST Handbook 44 App. C: 1 lb = 0.453 592 37 kg exactly.
  it('converts one pound to exactly 453.59237 g', () => {
    expect(toGrams(1, 'lb')).toBe(453.59237);
  });

  // NIST SP 811 App. B.8: 1 oz (avoirdupois) = 28.349 523 125 g exactly, i.e. 1/16 lb.
  it('converts one ounce to exactly 28.349523125 g, a sixteenth of a pound', () => {
    expect(toGrams(1, 'oz')).toBe(28.349523125);
    expect(GRAMS_PER_UNIT.oz * 16).toBeCloseTo(GRAMS_PER_UNIT.lb, 12);
    expect(convertWeight(1, 'lb', 'oz')).toBeCloseTo(16, 12);
  });

  it('converts kilograms by a factor of 1000 both ways', () => {
    expect(toGrams(2.5, 'kg')).toBe(2500);
    expect(fromGrams(2500, 'kg')).toBe(2.5);
  });

  it('returns the original value after a round trip through grams, for every unit', () => {
    fc.assert(
      fc.property(fc.constantFrom(...WEIGHT_UNITS), fc.double({ min: -1e6, max: 1e6, noNaN: true }), (unit, x) => {
        const back = fromGrams(toGrams(x, unit), unit);
        expect(Math.abs(back - x)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(x)));
      }),
    );
  });

  it('leaves a value untouched when converting to the same unit', () => {
    expect(convertWeight(0.1, 'oz', 'oz')).toBe(0.1);
  });

  it('recognises only the four supported unit codes', () => {
    expect(WEIGHT_UNITS).toEqual(['g', 'kg', 'lb', 'oz']);
    expect(isWeightUnit('lb')).toBe(true);
    expect(isWeightUnit('LB')).toBe(false);
    expect(isWeightUnit('t')).toBe(false);
    expect(isWeightUnit(1)).toBe(false);
  });
});
