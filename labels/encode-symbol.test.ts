import { describe, expect, it } from 'vitest';
import { encodeSymbol, placeSymbol } from './encode-symbol';

describe('encodeSymbol', () => {
  it('draws a Code 128 as one filled rectangle per bar: start, 9 data, check (11 modules each) and stop (13)', () => {
    const symbol = encodeSymbol({ symbology: 'code128', data: 'K-04-2-07' });
    expect([symbol.modulesWide, symbol.modulesHigh]).toEqual([11 * 11 + 13, 1]);
    // Code 128 has 3 bars in every symbol character and 4 in the stop (ISO/IEC 15417).
    expect(symbol.ops.match(/ re\n/g)).toHaveLength(11 * 3 + 4);
    // Start B begins with a bar 2 modules wide, then a space of 1 and a bar of 1 (2 1 1 2 1 4).
    expect(symbol.ops.startsWith('0 0 2 1 re\n3 0 1 1 re\n')).toBe(true);
    expect(symbol.ops.endsWith('f\n')).toBe(true);
  });

  it('draws a matrix symbol row by row, one rectangle per run of dark modules', () => {
    const qr = encodeSymbol({ symbology: 'qrcode', data: 'http://localhost:3000/parts/12' });
    // 30 bytes at error correction M need version 3, 29 × 29 modules (ISO/IEC 18004 capacity table, from memory).
    expect([qr.modulesWide, qr.modulesHigh]).toEqual([29, 29]);
    // Every QR row 0 starts with the top-left finder pattern's 7 dark modules (ISO/IEC 18004).
    expect(qr.ops.startsWith('0 0 7 1 re\n')).toBe(true);
    const dm = encodeSymbol({ symbology: 'gs1datamatrix', data: '(91)A:B' });
    // Data Matrix: the left column is the solid part of the finder (ISO/IEC 16022).
    for (let row = 0; row < dm.modulesHigh; row++) expect(dm.ops).toMatch(new RegExp(`^0 ${row} \\d+ 1 re$`, 'm'));
  });

  it('places a symbol with one matrix: modules to points, y flipped so the top is at `top`', () => {
    const symbol = encodeSymbol({ symbology: 'code128', data: 'K-04-2-07' });
    const ops = placeSymbol(symbol, { left: 10, top: 50, moduleSize: 0.75, barHeight: 20 });
    expect(ops.startsWith('q 0.75 0 0 -20 10 50 cm\n')).toBe(true);
    expect(ops.endsWith('Q\n')).toBe(true);
    expect(() => placeSymbol(symbol, { left: 0, top: 0, moduleSize: 1 })).toThrow(/bar height/);
  });
});
