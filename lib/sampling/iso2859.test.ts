import { describe, expect, it } from 'vitest';
import { codeLetter, samplingPlan, sampleSizeFor } from './iso2859';

describe('ISO 2859-1 sample-size code letters (Table 1), general inspection level II', () => {
  // Every lot-size boundary of Table 1, as reproduced in docs/references.md.
  it.each([
    [2, 'A'],
    [8, 'A'],
    [9, 'B'],
    [15, 'B'],
    [16, 'C'],
    [25, 'C'],
    [26, 'D'],
    [50, 'D'],
    [51, 'E'],
    [90, 'E'],
    [91, 'F'],
    [150, 'F'],
    [151, 'G'],
    [280, 'G'],
    [281, 'H'],
    [500, 'H'],
    [501, 'J'],
    [1200, 'J'],
    [1201, 'K'],
    [3200, 'K'],
    [3201, 'L'],
    [10000, 'L'],
    [10001, 'M'],
    [35000, 'M'],
    [35001, 'N'],
    [150000, 'N'],
    [150001, 'P'],
    [500000, 'P'],
    [500001, 'Q'],
  ])('lot of %s → %s', (lot, letter) => {
    expect(codeLetter(lot, 'II')).toBe(letter);
  });

  it('has levels I and III one column either side (from memory): lot 500 → F, H, J', () => {
    expect([codeLetter(500, 'I'), codeLetter(500, 'II'), codeLetter(500, 'III')]).toEqual(['F', 'H', 'J']);
    expect([codeLetter(2, 'I'), codeLetter(2, 'III'), codeLetter(600_000, 'III')]).toEqual(['A', 'B', 'R']);
  });

  it('gives the sample sizes of the master table (Table 2-A): A 2 … R 2000', () => {
    expect('ABCDEFGHJKLMNPQR'.split('').map(sampleSizeFor)).toEqual([2, 3, 5, 8, 13, 20, 32, 50, 80, 125, 200, 315, 500, 800, 1250, 2000]);
  });
});

describe('ISO 2859-1 single sampling, normal inspection (Table 2-A)', () => {
  it('reads the published examples: H at AQL 1.0 → n 50, Ac 1, Re 2; K at AQL 2.5 → n 125, Ac 7, Re 8', () => {
    expect(samplingPlan(500, 1.0)).toEqual({ codeLetter: 'H', sampleSize: 50, accept: 1, reject: 2, inspectAll: false });
    expect(samplingPlan(2000, 2.5)).toEqual({ codeLetter: 'K', sampleSize: 125, accept: 7, reject: 8, inspectAll: false });
  });

  it("follows an up arrow to the 0/1 plan with that plan's sample size (F at AQL 1.0 → E: n 13, Ac 0)", () => {
    expect(samplingPlan(100, 1.0)).toMatchObject({ codeLetter: 'F', sampleSize: 13, accept: 0, reject: 1 });
  });

  it('follows a down arrow to the 1/2 plan (G at AQL 1.0 → H: n 50, Ac 1)', () => {
    expect(samplingPlan(200, 1.0)).toMatchObject({ codeLetter: 'G', sampleSize: 50, accept: 1, reject: 2 });
  });

  it('follows down arrows above the 0/1 cell (B at AQL 0.65 → F: n 20, Ac 0)', () => {
    expect(samplingPlan(10, 0.65)).toMatchObject({ codeLetter: 'B', sampleSize: 10, accept: 0, reject: 1, inspectAll: true });
    expect(samplingPlan(5000, 0.065)).toMatchObject({ codeLetter: 'L', sampleSize: 200, accept: 0, reject: 1 });
  });

  it.each([
    [0.65, 'J', 1, 2],
    [0.65, 'L', 3, 4],
    [1.5, 'J', 3, 4],
    [4.0, 'H', 5, 6],
    [6.5, 'L', 21, 22],
    [0.4, 'N', 5, 6],
  ] as const)('AQL %s at letter %s → Ac %s, Re %s', (aql, letter, ac, re) => {
    const lot = { H: 500, J: 1200, L: 10000, N: 150000 }[letter];
    expect(samplingPlan(lot, aql)).toMatchObject({ codeLetter: letter, accept: ac, reject: re });
  });

  it('inspects every item when the sample would reach the lot', () => {
    expect(samplingPlan(3, 6.5)).toMatchObject({ sampleSize: 2, inspectAll: false });
    expect(samplingPlan(8, 0.1)).toMatchObject({ sampleSize: 8, inspectAll: true });
  });
});
