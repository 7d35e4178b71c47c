import { describe, expect, it } from 'vitest';
import { selectSample } from './select-sample';

describe('selecting an audit sample', () => {
  const lot = Array.from({ length: 500 }, (_, i) => i + 1);

  it('gives the same sample for the same seed and a different one for another seed', () => {
    expect(selectSample(lot, 50, 42)).toEqual(selectSample(lot, 50, 42));
    expect(selectSample(lot, 50, 42)).not.toEqual(selectSample(lot, 50, 43));
  });

  it('draws without replacement, from the lot only, and takes the whole lot when asked for more', () => {
    const s = selectSample(lot, 50, 7);
    expect(new Set(s).size).toBe(50);
    expect(s.every((x) => x >= 1 && x <= 500)).toBe(true);
    expect(selectSample([1, 2, 3], 10, 1).sort()).toEqual([1, 2, 3]);
  });

  it('gives every item about the same chance (2 000 draws of 10 from 20: each near 1 000 times)', () => {
    const hits = new Array(20).fill(0);
    const small = Array.from({ length: 20 }, (_, i) => i);
    for (let seed = 1; seed <= 2000; seed++) for (const x of selectSample(small, 10, seed)) hits[x]++;
    // Binomial(2000, 0.5): sd ≈ 22; ±110 is 5 sd.
    for (const h of hits) expect(Math.abs(h - 1000)).toBeLessThan(110);
  });
});
