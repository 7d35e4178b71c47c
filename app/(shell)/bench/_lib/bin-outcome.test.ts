import { describe, expect, it } from 'vitest';
import { describeBinOutcome } from './bin-outcome';

describe('describeBinOutcome', () => {
  it('says a held variance waits for a decision and the book stays', () => {
    const o = describeBinOutcome({ bookQuantity: 4000, counted: 3870, variance: -130, status: 'pending', wholePieceRange: 3 });
    expect(o.tone).toBe('caution');
    expect(o.text).toMatch(/^Held for a decision: counted 3870 ± 3 against a book of 4000 \(-130\).*book stays at 4000\.$/);
  });

  it("says what was booked, and warns when the difference is within the count's own range", () => {
    expect(describeBinOutcome({ bookQuantity: 6000, counted: 5951, variance: -49, status: 'applied', wholePieceRange: 129 })).toEqual({
      tone: 'caution',
      text: expect.stringMatching(/^Booked: the bin now holds 5951 \(book was 6000, -49\); counted 5951 ± 129\. The difference is within/),
    });
    expect(describeBinOutcome({ bookQuantity: 300, counted: 302, variance: 2, status: 'applied', wholePieceRange: 0 })).toEqual({
      tone: 'ok',
      text: 'Booked: the bin now holds 302 (book was 300, +2); counted 302 (exact).',
    });
  });

  it('says when there is nothing to change', () => {
    expect(describeBinOutcome({ bookQuantity: 310, counted: 310, variance: 0, status: 'applied', wholePieceRange: 1 }).text).toBe(
      'Nothing to change: counted 310 ± 1, the same as the book.',
    );
  });
});
