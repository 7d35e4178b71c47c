import { describe, expect, it } from 'vitest';
import { hb44ToleranceInD } from './hb44-tolerance';
import { mpeInE } from './mpe';

describe('NIST Handbook 44 Table 6 tolerances', () => {
  // Class III maintenance tolerances as reproduced: 0–500: 1 d; 501–2 000: 2 d; 2 001–4 000: 3 d; 4 001 and up: 5 d.
  it.each([
    [0, 1],
    [500, 1],
    [501, 2],
    [2_000, 2],
    [2_001, 3],
    [4_000, 3],
    [4_001, 5],
    [10_000, 5],
  ])('class III at %s d: %s d in maintenance, half that on acceptance (T.N.3.2)', (load, tol) => {
    expect(hb44ToleranceInD('III', load)).toBe(tol);
    expect(hb44ToleranceInD('III', load, 'acceptance')).toBe(tol / 2);
  });

  it('differs from OIML R 76 above 4 000 d in class III: 5 d in maintenance against 3 e in service', () => {
    expect(hb44ToleranceInD('III', 5_000)).toBe(5);
    expect(mpeInE('III', 5_000, 'in_service')).toBe(3);
  });

  it('matches OIML on acceptance up to 4 000 d in class III (0.5 / 1 / 1.5 d)', () => {
    for (const load of [100, 1_000, 3_000]) expect(hb44ToleranceInD('III', load, 'acceptance')).toBe(mpeInE('III', load));
  });

  it('has the class IIII rows from memory: 0–50: 1, 51–200: 2, 201–400: 3, above: 5', () => {
    expect([50, 51, 200, 201, 400, 401].map((d) => hb44ToleranceInD('IIII', d))).toEqual([1, 2, 2, 3, 3, 5]);
  });
});
