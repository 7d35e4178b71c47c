/**
 * Mass units and their exact conversion to grams.
 * Factors are exact by definition: NIST SP 811 (2008) Appendix B and
 * NIST Handbook 44 Appendix C — 1 lb = 0.453 592 37 kg, 1 oz = 1/16 lb.
 */
export type WeightUnit = 'g' | 'kg' | 'lb' | 'oz';

export const WEIGHT_UNITS: readonly WeightUnit[] = ['g', 'kg', 'lb', 'oz'];

export const GRAMS_PER_UNIT: Readonly<Record<WeightUnit, number>> = {
  g: 1,
  kg: 1000,
  lb: 453.59237,
  oz: 28.349523125,
};

export function isWeightUnit(value: unknown): value is WeightUnit {
  return typeof value === 'string' && (WEIGHT_UNITS as readonly string[]).includes(value);
}

export function toGrams(value: number, unit: WeightUnit): number {
  return value * GRAMS_PER_UNIT[unit];
}

export function fromGrams(grams: number, unit: WeightUnit): number {
  return grams / GRAMS_PER_UNIT[unit];
}

export function convertWeight(value: number, from: WeightUnit, to: WeightUnit): number {
  return from === to ? value : fromGrams(toGrams(value, from), to);
}
