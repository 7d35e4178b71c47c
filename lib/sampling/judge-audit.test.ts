import { describe, expect, it } from 'vitest';
import { judgeAuditItem, judgeLot } from './judge-audit';

describe('judging recounts', () => {
  it('accepts a hand count inside count ± U in whole pieces', () => {
    expect(judgeAuditItem({ count: 1011, wholePieceRange: 8, exact: false, handCount: 1003 })).toEqual({ error: 8, withinUncertainty: true, exactRight: null });
    expect(judgeAuditItem({ count: 1011, wholePieceRange: 8, exact: false, handCount: 1002 }).withinUncertainty).toBe(false);
  });

  it('holds an exact count to exactly the hand count', () => {
    expect(judgeAuditItem({ count: 100, wholePieceRange: 0, exact: true, handCount: 100 })).toEqual({ error: 0, withinUncertainty: true, exactRight: true });
    expect(judgeAuditItem({ count: 100, wholePieceRange: 0, exact: true, handCount: 99 })).toEqual({ error: 1, withinUncertainty: false, exactRight: false });
  });

  it('accepts a lot at Ac nonconforming items and rejects at Re (ISO 2859-1 single sampling)', () => {
    expect(judgeLot(1, 1)).toBe('accepted');
    expect(judgeLot(2, 1)).toBe('rejected');
  });
});
