import { describe, expect, it } from 'vitest';
import { formatBinCode, parseBinCode } from './bin-code';

describe('bin codes', () => {
  it('reads zone, rack, shelf and slot, whatever the case typed', () => {
    expect(parseBinCode('k-04-2-07')).toEqual({ zone: 'K', rack: 4, shelf: 2, slot: 7 });
    expect(parseBinCode(' KA-12-9-99 ')).toEqual({ zone: 'KA', rack: 12, shelf: 9, slot: 99 });
  });

  it('refuses rack or slot 00, shelf 0, and other shapes', () => {
    for (const bad of ['K-00-2-07', 'K-04-0-07', 'K-04-2-00', 'K-4-2-07', 'KAB-04-2-07', 'K042 07', '']) expect(parseBinCode(bad), bad).toBeNull();
  });

  it('formats back to the canonical code', () => {
    expect(formatBinCode({ zone: 'M', rack: 3, shelf: 1, slot: 12 })).toBe('M-03-1-12');
    expect(formatBinCode(parseBinCode('m-03-1-12')!)).toBe('M-03-1-12');
  });
});
