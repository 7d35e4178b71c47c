import { describe, expect, it } from 'vitest';
import { describeUnprintable, fromCodePointList, toCodePointList } from './unprintable';

describe('unprintable characters', () => {
  // Code points as the Unicode code charts give them (from memory: 漢 U+6F22, 字 U+5B57, 🔩 U+1F529).
  it('writes characters as U+ code points and reads them back, astral ones included', () => {
    expect(toCodePointList(['漢', '字', '🔩'])).toBe('U+6F22 U+5B57 U+1F529');
    expect(fromCodePointList('U+6F22 U+5B57 U+1F529')).toEqual(['漢', '字', '🔩']);
    expect(toCodePointList(['\t'])).toBe('U+0009');
  });

  it('ignores anything in the header that is not a code point', () => {
    expect(fromCodePointList(null)).toEqual([]);
    expect(fromCodePointList('U+6F22 <script> U+ZZZZ U+1234567')).toEqual(['漢']);
  });

  it('says what was printed instead, naming each character', () => {
    expect(describeUnprintable(['漢'])).toMatch(/^Printed as "\?": 漢 \(U\+6F22\)\./);
  });
});
