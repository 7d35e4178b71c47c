import { describe, expect, it } from 'vitest';
import { fitModule, QUIET_ZONE } from './module-size';
import { MODULE_SIZES } from './stocks';
import { millimetres } from './units';

const candidates = Object.values(MODULE_SIZES);

describe('fitModule', () => {
  it('picks the largest module at which the symbol and both quiet zones fit', () => {
    // 134 modules + 2 × 10 quiet = 154 modules; at 0.5 mm that is 77 mm.
    expect(fitModule({ modules: 134, quietModules: QUIET_ZONE.code128, available: millimetres(80), candidates })).toBe(MODULE_SIZES.large);
    expect(fitModule({ modules: 134, quietModules: QUIET_ZONE.code128, available: millimetres(76.9), candidates })).toBe(MODULE_SIZES.medium);
  });

  it('counts the quiet zones: a symbol that fits bare but not with them gets a smaller module', () => {
    expect(fitModule({ modules: 100, quietModules: 0, available: millimetres(50), candidates })).toBe(MODULE_SIZES.large);
    expect(fitModule({ modules: 100, quietModules: 10, available: millimetres(50), candidates })).toBe(MODULE_SIZES.medium);
  });

  it('answers null when even the smallest module does not fit', () => {
    expect(fitModule({ modules: 400, quietModules: 10, available: millimetres(50), candidates })).toBeNull();
  });

  it('uses the quiet zones of the symbology specifications', () => {
    expect(QUIET_ZONE).toEqual({ code128: 10, qrcode: 4, datamatrix: 2 });
  });
});
