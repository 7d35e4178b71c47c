import { describe, expect, it } from 'vitest';
import { describeWarning, isWarningCode, makeWarning, WARNING_CODES, WARNING_TEXT } from './warnings';

describe('warnings', () => {
  it('has exactly the codes of the warnings table in docs/counting-model.md', () => {
    expect([...WARNING_CODES]).toEqual([
      'apw_below_resolution',
      'below_min_capacity',
      'count_not_exact',
      'sample_too_small',
      'over_capacity',
      'cv_assumed',
      'single_piece_not_resolved',
      'not_whole_pieces',
      'unstable',
      'scale_locked',
    ]);
    expect(Object.keys(WARNING_TEXT).sort()).toEqual([...WARNING_CODES].sort());
  });

  it('gives every code its own message and a remedy', () => {
    const messages = WARNING_CODES.map((code) => describeWarning(code).message);
    expect(new Set(messages).size).toBe(WARNING_CODES.length);
    for (const code of WARNING_CODES) {
      expect(describeWarning(code).message.length).toBeGreaterThan(20);
      expect(describeWarning(code).remedy.length).toBeGreaterThan(20);
      expect(describeWarning(code).message).not.toContain('_');
    }
  });

  it('builds the response shape { code, message }', () => {
    expect(makeWarning('cv_assumed')).toEqual({ code: 'cv_assumed', message: WARNING_TEXT.cv_assumed.message });
  });

  it('recognises known codes only', () => {
    expect(isWarningCode('unstable')).toBe(true);
    expect(isWarningCode('UNSTABLE')).toBe(false);
  });
});
