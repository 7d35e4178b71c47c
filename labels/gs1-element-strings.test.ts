import { describe, expect, it } from 'vitest';
import { bracketed, GROUP_SEPARATOR, isCset82, transmitted } from './gs1-element-strings';

describe('GS1 element strings', () => {
  it('writes the bracketed human-readable form', () => {
    expect(
      bracketed([
        { ai: '91', value: 'ACT-20:B' },
        { ai: '93', value: '50' },
      ]),
    ).toBe('(91)ACT-20:B(93)50');
  });

  it('ends a variable-length element with FNC1 (sent as GS) only when another follows (GS1 General Specifications)', () => {
    expect(
      transmitted([
        { ai: '92', value: 'BO-2026-00042' },
        { ai: '93', value: '50' },
      ]),
    ).toBe(`92BO-2026-00042${GROUP_SEPARATOR}9350`);
    expect(transmitted([{ ai: '93', value: '50' }])).toBe('9350');
  });

  it('needs no separator after a predefined-length AI such as (01)', () => {
    expect(
      transmitted([
        { ai: '01', value: '06291041500213' },
        { ai: '30', value: '50' },
        { ai: '10', value: 'BO-1' },
      ]),
    ).toBe(`0106291041500213${'30'}50${GROUP_SEPARATOR}10BO-1`);
  });

  it('accepts character set 82 and refuses spaces and characters outside it', () => {
    expect(isCset82(`ACT-20/B.x_y:z!"%&'()*+,;<=>?`)).toBe(true);
    expect(isCset82('ACT 20')).toBe(false);
    expect(isCset82('µ')).toBe(false);
  });
});
