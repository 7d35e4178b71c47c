import { describe, expect, it } from 'vitest';
import { assessLoad } from './load-cautions';

describe('assessLoad', () => {
  it('flags a load at 90 % of Max as near capacity', () => {
    expect(assessLoad({ gross: 5400, capacity: 6000 }).level).toBe('near');
    expect(assessLoad({ gross: 5399, capacity: 6000 }).level).toBe('ok');
  });

  it('flags a load above Max as over capacity', () => {
    expect(assessLoad({ gross: 6000.1, capacity: 6000 }).level).toBe('over');
  });

  it('asks for a two-person lift above the 23 kg NIOSH load constant (revised NIOSH lifting equation)', () => {
    expect(assessLoad({ gross: 23_500, capacity: 60_000 }).heavyLift).toBe(true);
    expect(assessLoad({ gross: 100, capacity: 60_000, containerWeight: 24_000 }).heavyLift).toBe(true);
    expect(assessLoad({ gross: 22_900, capacity: 60_000 }).heavyLift).toBe(false);
  });
});
