import { describe, expect, it } from 'vitest';
import { safeCell } from './csv-safe';

describe('CSV cells (OWASP CSV injection guidance)', () => {
  it('prefixes text that a spreadsheet would run as a formula', () => {
    for (const bad of ['=1+1', '+SUM(A1)', '-2+3', '@cmd', '\t=x', '\r=x']) expect(safeCell(bad)).toBe(`'${bad}`);
  });

  it('leaves ordinary text and numbers alone, including negative numbers', () => {
    expect(safeCell('M3 screw')).toBe('M3 screw');
    expect(safeCell(-4)).toBe(-4);
    expect(safeCell(null)).toBe('');
  });
});
