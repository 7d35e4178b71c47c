/**
 * Line-format profiles for scales that send one ASCII line per reading, kept as data.
 * A profile's pattern names its fields with groups: sign, weight, unit, flag.
 * These three are Tallyforge's own generic formats; a site adds its own the same way.
 */
import type { WeightUnit } from '../weighing/units';

export interface LineProfile {
  readonly name: string;
  readonly description: string;
  /** Groups: `weight` (required), `sign`, `unit`, `flag` (optional). */
  readonly pattern: RegExp;
  /** Unit when the line carries none. */
  readonly defaultUnit: WeightUnit;
  /** Flag text → stable. */
  readonly flags?: Readonly<Record<string, boolean>>;
  /** How a line is written, for fakes and tests: {flag} {sign} {weight} {unit}. */
  readonly template: string;
  /** Sign written for positive weights ('' or '+'). */
  readonly positiveSign: '' | '+';
  /** Zero-pad the weight to this many characters when writing (0: no padding). */
  readonly weightWidth: number;
}

export const LINE_PROFILES: readonly LineProfile[] = [
  {
    name: 'plain-grams',
    description: 'A bare number in grams, optional minus sign, no unit or stability flag: "-12.35"',
    pattern: /^\s*(?<sign>[+-]?)\s*(?<weight>\d+(?:\.\d+)?)\s*$/,
    defaultUnit: 'g',
    template: '{sign}{weight}',
    positiveSign: '',
    weightWidth: 0,
  },
  {
    name: 'signed-unit-flag',
    description: 'Flag "@" settled or "~" moving, a sign, a zero-padded weight and a unit: "@ +0012.345 g"',
    pattern: /^\s*(?<flag>[@~])\s*(?<sign>[+-])\s*(?<weight>\d+(?:\.\d+)?)\s*(?<unit>[A-Za-z]+)\s*$/,
    defaultUnit: 'g',
    flags: { '@': true, '~': false },
    template: '{flag} {sign}{weight} {unit}',
    positiveSign: '+',
    weightWidth: 8,
  },
  {
    name: 'comma-fields',
    description: 'Weight, unit and state separated by commas: "12.50,g,steady" or "-0.4,kg,moving"',
    pattern: /^\s*(?<sign>[+-]?)(?<weight>\d+(?:\.\d+)?)\s*,\s*(?<unit>[A-Za-z]+)\s*,\s*(?<flag>steady|moving)\s*$/,
    defaultUnit: 'g',
    flags: { steady: true, moving: false },
    template: '{sign}{weight},{unit},{flag}',
    positiveSign: '',
    weightWidth: 0,
  },
];

export function findLineProfile(name: string): LineProfile | undefined {
  return LINE_PROFILES.find((profile) => profile.name === name);
}

const UNIT_WORDS: Readonly<Record<string, WeightUnit>> = { g: 'g', kg: 'kg', lb: 'lb', lbs: 'lb', oz: 'oz' };

/** Unit text as sent by a scale (any case, "lbs" too) → our unit, or undefined. */
export function readUnitWord(text: string): WeightUnit | undefined {
  return Object.prototype.hasOwnProperty.call(UNIT_WORDS, text.toLowerCase()) ? UNIT_WORDS[text.toLowerCase()] : undefined;
}
