import { describe, expect, it } from 'vitest';
import { isWellFormedText } from './well-formed-text';

describe('isWellFormedText', () => {
  // Checked against the engine's own String.prototype.isWellFormed (ECMAScript 2024), where present.
  const cases: Array<[string, boolean]> = [
    ['M3 × 8 — Ø 6 mm', true],
    ['bolt 🔩 pair', true], // U+1F529 as a surrogate pair
    ['\uD83D', false], // a lone high surrogate
    ['a\uDC00b', false], // a lone low surrogate
    ['\uDC00\uD83D', false], // the pair in the wrong order
    ['', true],
  ];
  it.each(cases)('%j → %s', (text, expected) => {
    expect(isWellFormedText(text)).toBe(expected);
    const native = (text as unknown as { isWellFormed?: () => boolean }).isWellFormed;
    if (native) expect(native.call(text)).toBe(expected);
  });
});
