import { describe, expect, it } from 'vitest';
import { calibrationOverdue } from './calibration-due';

describe('calibration overdue', () => {
  it('is overdue from the day after the due date, not on it', () => {
    expect(calibrationOverdue('2026-12-02', '2026-12-03')).toBe(true);
    expect(calibrationOverdue('2026-12-03', '2026-12-03')).toBe(false);
    expect(calibrationOverdue('2027-01-01', '2026-12-31')).toBe(false);
    expect(calibrationOverdue(null, '2026-12-03')).toBe(false);
  });
});
