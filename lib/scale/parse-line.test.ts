import { describe, expect, it } from 'vitest';
import { findLineProfile, LINE_PROFILES, readUnitWord } from './line-format';
import { formatLine, parseLine } from './parse-line';

const plain = findLineProfile('plain-grams')!;
const flagged = findLineProfile('signed-unit-flag')!;
const comma = findLineProfile('comma-fields')!;

describe('line profiles', () => {
  it('ships three generic profiles with their own names', () => {
    expect(LINE_PROFILES.map((p) => p.name)).toEqual(['plain-grams', 'signed-unit-flag', 'comma-fields']);
    expect(findLineProfile('nope')).toBeUndefined();
  });

  it('reads unit words in any case, "lbs" included', () => {
    expect(readUnitWord('KG')).toBe('kg');
    expect(readUnitWord('lbs')).toBe('lb');
    expect(readUnitWord('ct')).toBeUndefined();
    expect(readUnitWord('constructor')).toBeUndefined();
  });
});

describe('parseLine', () => {
  it('reads a bare number as grams with no stability flag', () => {
    expect(parseLine(plain, '  -12.35 ')).toEqual({ ok: true, fields: { gross: -12.35, unit: 'g' } });
    expect(parseLine(plain, '0.00')).toEqual({ ok: true, fields: { gross: 0, unit: 'g' } });
  });

  it('reads the flag, sign, weight and unit of a flagged line', () => {
    expect(parseLine(flagged, '@ +0012.345 g')).toEqual({ ok: true, fields: { gross: 12.345, unit: 'g', stable: true } });
    expect(parseLine(flagged, '~ -0001.20 kg')).toEqual({ ok: true, fields: { gross: -1.2, unit: 'kg', stable: false } });
  });

  it('reads comma-separated weight, unit and state', () => {
    expect(parseLine(comma, '3.5,lb,steady')).toEqual({ ok: true, fields: { gross: 3.5, unit: 'lb', stable: true } });
    expect(parseLine(comma, '-0.40,oz,moving')).toEqual({ ok: true, fields: { gross: -0.4, unit: 'oz', stable: false } });
  });

  it('turns a negative zero into plain zero', () => {
    const r = parseLine(flagged, '@ -0000.00 g');
    expect(r.ok && Object.is(r.fields.gross, 0)).toBe(true);
  });

  it('says why a line was refused', () => {
    expect(parseLine(plain, '   ')).toEqual({ ok: false, reason: 'empty' });
    expect(parseLine(plain, '1'.repeat(81))).toEqual({ ok: false, reason: 'too_long' });
    expect(parseLine(plain, '12.3 g')).toEqual({ ok: false, reason: 'no_match' });
    expect(parseLine(flagged, '@ +12.3 ct')).toEqual({ ok: false, reason: 'unknown_unit' });
    expect(parseLine(comma, '12.3,g,wobbly')).toEqual({ ok: false, reason: 'no_match' });
    expect(parseLine(flagged, '@ 12.3 g')).toEqual({ ok: false, reason: 'no_match' });
  });
});

describe('formatLine', () => {
  it('writes each profile’s line shape', () => {
    expect(formatLine(plain, { gross: -12.3456, unit: 'g' }, 2)).toBe('-12.35');
    expect(formatLine(flagged, { gross: 12.345, unit: 'g', stable: true }, 3)).toBe('@ +0012.345 g');
    expect(formatLine(flagged, { gross: -1.2, unit: 'kg' }, 2)).toBe('~ -00001.20 kg');
    expect(formatLine(comma, { gross: 3.5, unit: 'lb', stable: true }, 1)).toBe('3.5,lb,steady');
  });

  it('refuses a unit that a unitless profile cannot carry', () => {
    expect(() => formatLine(plain, { gross: 1, unit: 'kg' }, 2)).toThrow(RangeError);
  });
});
