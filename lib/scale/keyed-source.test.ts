import { describe, expect, it } from 'vitest';
import { createKeyedSource, readKeyedWeight } from './keyed-source';
import type { Reading } from './reading';

describe('createKeyedSource', () => {
  it('emits one stable reading per typed weight', async () => {
    const source = createKeyedSource({ unit: 'kg', now: () => 42 });
    const got: Reading[] = [];
    source.subscribe((r) => got.push(r));
    await source.start();
    source.enter('1,25');
    source.enter(0.5);
    expect(got).toEqual([
      { t: 42, gross: 1.25, unit: 'kg', stable: true },
      { t: 42, gross: 0.5, unit: 'kg', stable: true },
    ]);
    expect(source.kind).toBe('keyed');
  });

  it('refuses entries that are not weights, or while stopped', async () => {
    const source = createKeyedSource({ unit: 'g' });
    expect(() => source.enter(1)).toThrow(/not started/);
    await source.start();
    expect(() => source.enter('12 g')).toThrow(RangeError);
    expect(() => source.enter(Number.NaN)).toThrow(RangeError);
  });

  it('reads typed text with a decimal point or comma', () => {
    expect(readKeyedWeight(' 12.5 ')).toBe(12.5);
    expect(readKeyedWeight('0,75')).toBe(0.75);
    expect(readKeyedWeight('.5')).toBe(0.5);
    expect(() => readKeyedWeight('1,000.5')).toThrow(RangeError);
  });
});
