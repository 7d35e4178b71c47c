/**
 * Mass conversion factors against NIST SP 811 (2008 edition) Appendix B.8 and NIST Handbook 44
 * Appendix C (exact by definition: 1 lb = 0.453 592 37 kg, 1 oz = 28.349 523 125 g), and an
 * independent check against the npm package convert-units 2.3.4 (test-only dependency).
 */
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { convertWeight, fromGrams, GRAMS_PER_UNIT, toGrams, WEIGHT_UNITS, type WeightUnit } from '../../lib/weighing/units';

// convert-units ships no types; this is the slice of its chained API the check uses.
type ConvertUnits = (value: number) => { from(unit: string): { to(unit: string): number } };
const convert = createRequire(import.meta.url)('convert-units') as ConvertUnits;

describe('NIST SP 811 / HB 44 App. C exact factors', () => {
  it('defines the pound as exactly 0.45359237 kg', () => {
    expect(GRAMS_PER_UNIT.lb).toBe(453.59237);
    expect(convertWeight(1, 'lb', 'kg')).toBe(0.45359237);
  });

  it('defines the avoirdupois ounce as exactly 28.349523125 g', () => {
    expect(GRAMS_PER_UNIT.oz).toBe(28.349523125);
  });

  // HB 44 App. C tables print 1 kg = 2.204 622 6 lb = 35.273 962 oz (from memory); they follow from the exact factors.
  it('gives the published reciprocal factors to their printed digits', () => {
    expect(fromGrams(1000, 'lb')).toBeCloseTo(2.2046226, 7);
    expect(fromGrams(1000, 'oz')).toBeCloseTo(35.273962, 6);
  });
});

describe('agreement with convert-units (independent implementation)', () => {
  const pairs: [WeightUnit, WeightUnit][] = WEIGHT_UNITS.flatMap((a) => WEIGHT_UNITS.map((b) => [a, b] as [WeightUnit, WeightUnit]));

  it('agrees within metric and within imperial units to 12 digits', () => {
    for (const [from, to] of pairs) {
      const sameSystem = (from === 'lb' || from === 'oz') === (to === 'lb' || to === 'oz');
      if (!sameSystem) continue;
      expect(convertWeight(7.25, from, to)).toBeCloseTo(convert(7.25).from(from).to(to), 12);
    }
  });

  // convert-units bridges metric and imperial with 1 lb = 453.592 g (rounded to 6 digits),
  // so across systems it can only agree to about 8e-7 relative; ours is the exact factor.
  it('agrees across systems to within the rounding of its 453.592 g bridge', () => {
    for (const [from, to] of pairs) {
      const ours = convertWeight(123.456, from, to);
      const theirs = convert(123.456).from(from).to(to);
      expect(Math.abs(ours / theirs - 1)).toBeLessThan(1e-6);
    }
    expect(Math.abs(toGrams(1, 'lb') - convert(1).from('lb').to('g'))).toBeCloseTo(0.00037, 8);
  });
});
