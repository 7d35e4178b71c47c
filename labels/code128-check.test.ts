import bwipjs from 'bwip-js/node';
import { describe, expect, it } from 'vitest';
import { code128CheckValue, code128SetBValues } from './code128-check';

// Bar/space widths of each symbol character in bwip-js's raw output, start to check character:
// 6 elements each, then the 7-element stop, which is left off.
function symbolWidths(text: string): number[][] {
  const [{ sbs }] = bwipjs.raw('code128', text, {}) as Array<{ sbs: number[] }>;
  const count = (sbs.length - 7) / 6;
  return Array.from({ length: count }, (_, i) => sbs.slice(6 * i, 6 * i + 6));
}

describe('Code 128 check character (ISO/IEC 15417)', () => {
  it('matches the standard worked example: "HI345678" as Start A, H, I, CODE C, 34, 56, 78 → sum 1406 → 67', () => {
    const values = [103, 40, 41, 99, 34, 56, 78];
    expect(values[0] + values.slice(1).reduce((s, v, i) => s + (i + 1) * v, 0)).toBe(1406);
    expect(code128CheckValue(values)).toBe(67);
  });

  it('agrees with the check character bwip-js prints for a bin code', () => {
    const code = 'K-04-2-07';
    const symbols = symbolWidths(code);
    // Start B is 2 1 1 2 1 4 (ISO/IEC 15417 symbol value 104; from memory).
    expect(symbols[0]).toEqual([2, 1, 1, 2, 1, 4]);
    const check = code128CheckValue(code128SetBValues(code));
    // The check character is printed as the symbol character of that value; in code set B, value v is ASCII v + 32.
    const [, sameValue] = symbolWidths(String.fromCharCode(check + 32));
    expect(symbols.at(-1)).toEqual(sameValue);
    expect(symbols).toHaveLength(code.length + 2);
  });

  it('refuses values outside the symbol set and characters set B cannot carry', () => {
    expect(() => code128CheckValue([104, 106])).toThrow(RangeError);
    expect(() => code128SetBValues('tab\there')).toThrow(RangeError);
  });
});
