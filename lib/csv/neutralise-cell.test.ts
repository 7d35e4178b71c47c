import { describe, expect, it } from 'vitest';
import { neutraliseCell } from './neutralise-cell';

describe('neutraliseCell', () => {
  it('prefixes a quote to every cell a spreadsheet would run as a formula (OWASP CSV Injection)', () => {
    for (const start of ['=', '+', '-', '@', '\t', '\r']) expect(neutraliseCell(`${start}SUM(A1)`)).toBe(`'${start}SUM(A1)`);
  });

  it('leaves ordinary text and numbers alone and writes nothing for missing values', () => {
    expect(neutraliseCell('M3 × 8 pan head')).toBe('M3 × 8 pan head');
    expect(neutraliseCell('a=b')).toBe('a=b');
    expect(neutraliseCell(0.25)).toBe('0.25');
    expect(neutraliseCell(null)).toBe('');
  });

  it('neutralises negative numbers written as text, which a spreadsheet would also evaluate', () => {
    expect(neutraliseCell(-3)).toBe("'-3");
  });
});
