import bwipjs from 'bwip-js/node';
import { describe, expect, it } from 'vitest';
import { bracketed } from './gs1-element-strings';
import { kitElementStrings, KitLabelDataError } from './kit-element-strings';

const kit = { kitCode: 'ACT-20-ENDCAP', revision: 'B', orderNumber: 'BO-2026-00042', quantity: 50 };

describe('kit element strings', () => {
  it('carries kit and revision, order number and count in the company-internal AIs (91), (92), (93)', () => {
    expect(kitElementStrings(kit)).toEqual([
      [{ ai: '91', value: 'ACT-20-ENDCAP:B' }],
      [
        { ai: '92', value: 'BO-2026-00042' },
        { ai: '93', value: '50' },
      ],
    ]);
  });

  it('with a GTIN uses (01) with its check digit, (30) for the count and (10) for the order as the lot', () => {
    // GS1 General Specifications §7.9.1 worked example: 629104150021 → check digit 3.
    expect(kitElementStrings({ ...kit, gtin: '6291041500213' }).flat()).toEqual([
      { ai: '01', value: '06291041500213' },
      { ai: '30', value: '50' },
      { ai: '10', value: 'BO-2026-00042' },
    ]);
    expect(() => kitElementStrings({ ...kit, gtin: '6291041500212' })).toThrow(RangeError);
  });

  it('satisfies the GS1 pairing rules that bwip-js enforces in a DataMatrix; (30) alone would not', () => {
    for (const gtin of [null, '6291041500213']) {
      expect(() => bwipjs.raw('gs1datamatrix', bracketed(kitElementStrings({ ...kit, gtin }).flat()), {})).not.toThrow();
    }
    // GS1 pairing rules: (30) requires (01) or (02).
    expect(() => bwipjs.raw('gs1datamatrix', '(30)50', {})).toThrow(/01 OR 02/);
  });

  it('refuses data a GS1 symbol cannot carry or that would make the fields ambiguous', () => {
    expect(() => kitElementStrings({ ...kit, kitCode: 'ACT 20' })).toThrow(KitLabelDataError);
    expect(() => kitElementStrings({ ...kit, kitCode: 'ACT:20' })).toThrow(KitLabelDataError);
    expect(() => kitElementStrings({ ...kit, quantity: 0 })).toThrow(KitLabelDataError);
    expect(() => kitElementStrings({ ...kit, quantity: 1e8 })).toThrow(KitLabelDataError);
  });
});
