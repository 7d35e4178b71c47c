import { describe, expect, it } from 'vitest';
import { isDue, needsApproval, variancePercent } from './variance';

const limits = { pieces: 5, percent: 2 };

describe('cycle-count variances', () => {
  it('lets small variances through on either limit and stops those beyond both', () => {
    expect(needsApproval(6, 10_000, limits)).toBe(false); // 6 pcs but 0.06 %
    expect(needsApproval(3, 20, limits)).toBe(false); // 15 % but 3 pcs
    expect(needsApproval(-30, 1_000, limits)).toBe(true); // 30 pcs and 3 %
    expect(needsApproval(5, 100, limits)).toBe(false); // at the pieces limit, not beyond
  });

  it('treats any variance on an empty book as beyond the percent limit', () => {
    expect(variancePercent(7, 0)).toBe(Infinity);
    expect(needsApproval(7, 0, limits)).toBe(true);
    expect(variancePercent(0, 0)).toBe(0);
  });

  it('schedules A bins monthly, C bins twice a year, never-counted bins at once', () => {
    const now = new Date('2026-12-02T00:00:00Z');
    expect(isDue(null, 'C', now)).toBe(true);
    expect(isDue(new Date('2026-11-01T00:00:00Z'), 'A', now)).toBe(true);
    expect(isDue(new Date('2026-11-01T00:00:00Z'), 'B', now)).toBe(false);
    expect(isDue(new Date('2026-07-01T00:00:00Z'), 'C', now)).toBe(false);
    expect(isDue(new Date('2026-06-01T00:00:00Z'), 'C', now)).toBe(true);
  });
});
