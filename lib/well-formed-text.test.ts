import { describe, expect, it } from 'vitest';
import { isWellFormedPath, isWellFormedText } from './well-formed-text';

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

describe('isWellFormedPath', () => {
  // Reference: the escapes turned into bytes here and read by the WHATWG UTF-8 decoder in fatal mode
  // (TextDecoder), which refuses what RFC 3629 does: stray bytes, overlong forms, encoded surrogates.
  function referenceDecodes(path: string): boolean {
    const bytes: number[] = [];
    for (let i = 0; i < path.length; i++) {
      const escape = path[i] === '%' ? /^[0-9a-f]{2}$/i.exec(path.slice(i + 1, i + 3)) : null;
      if (path[i] === '%' && !escape) return false;
      if (escape) {
        bytes.push(parseInt(escape[0], 16));
        i += 2;
      } else bytes.push(...new TextEncoder().encode(path[i]));
    }
    try {
      new TextDecoder('utf-8', { fatal: true }).decode(new Uint8Array(bytes));
      return true;
    } catch {
      return false;
    }
  }
  const cases: Array<[string, boolean]> = [
    ['/api/v1/parts/12', true],
    ['/api/v1/parts/%E2%82%AC', true], // "€"
    ['/api/v1/bins/K-01%2F2', true],
    ['/api/v1/parts/%FF', false], // never a UTF-8 byte
    ['/api/v1/parts/%E0%A4%A', false], // an escape cut short
    ['/api/v1/parts/%E2%82', false], // a sequence cut short
    ['/api/v1/parts/%C0%AF', false], // an overlong "/"
    ['/api/v1/parts/%ED%A0%80', false], // an encoded surrogate
    ['/api/v1/parts/%', false],
  ];
  it.each(cases)('%s → %s', (path, expected) => {
    expect(isWellFormedPath(path)).toBe(expected);
    expect(referenceDecodes(path)).toBe(expected);
  });
});
