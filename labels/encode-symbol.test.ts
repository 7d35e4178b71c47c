import { describe, expect, it } from 'vitest';
import { encodeSymbol, placeSymbol } from './encode-symbol';

describe('encodeSymbol', () => {
  it('draws a Code 128 as filled bar rectangles, one module per pixel: start, 9 data, check (11 each) and stop (13)', () => {
    const symbol = encodeSymbol({ symbology: 'code128', data: 'K-04-2-07' });
    expect(symbol.modulesWide).toBe(11 * 11 + 13);
    expect(symbol.modulesHigh).toBe(1);
    // Code 128 has 3 bars in every symbol character and 4 in the stop (ISO/IEC 15417).
    expect(symbol.ops.match(/ re\n/g)).toHaveLength(11 * 3 + 4);
    expect(symbol.ops.endsWith('f\n')).toBe(true);
  });

  it('draws matrix symbols as even-odd filled outlines, two pixels per module', () => {
    const qr = encodeSymbol({ symbology: 'qrcode', data: 'http://localhost:3000/parts/12' });
    // 31 bytes at error correction M need version 3, 29 × 29 modules (ISO/IEC 18004 capacity table, from memory).
    expect([qr.modulesWide, qr.modulesHigh, qr.width]).toEqual([29, 29, 58]);
    expect(qr.ops).toMatch(/^0 \d+ m .* h\n/);
    expect(qr.ops.trimEnd().endsWith('f*')).toBe(true);
    expect(encodeSymbol({ symbology: 'gs1datamatrix', data: '(91)A:B' }).modulesWide).toBeGreaterThanOrEqual(10);
  });

  it('places a symbol with one matrix: modules to points, y flipped so the top is at `top`', () => {
    const symbol = encodeSymbol({ symbology: 'code128', data: 'K-04-2-07' });
    const ops = placeSymbol(symbol, { left: 10, top: 50, moduleSize: 0.75, barHeight: symbol.height * 0.5 });
    expect(ops.startsWith('q 0.75 0 0 -0.5 10 50 cm\n')).toBe(true);
    expect(ops.endsWith('Q\n')).toBe(true);
    expect(() => placeSymbol(symbol, { left: 0, top: 0, moduleSize: 1 })).toThrow(/bar height/);
  });
});
