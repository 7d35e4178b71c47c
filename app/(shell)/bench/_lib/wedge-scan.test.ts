import { describe, expect, it } from 'vitest';
import { afterScan, createWedgeDetector } from './wedge-scan';

function type(text: string, start: number, gapMs: number, detector = createWedgeDetector()) {
  let t = start;
  for (const ch of text) {
    detector.key(ch, t);
    t += gapMs;
  }
  return detector.key('Enter', t);
}

describe('wedge scanner detection', () => {
  it('takes a fast burst ending in Enter as a scan', () => {
    expect(type('K-01-1-01', 0, 8)).toBe('K-01-1-01');
  });

  it('does not take a person typing as a scan, nor a short burst', () => {
    expect(type('K-01-1-01', 0, 120)).toBeNull();
    expect(type('ab', 0, 5)).toBeNull();
  });

  it('starts a new scan after a pause, so a second scan is read on its own', () => {
    const d = createWedgeDetector();
    expect(type('K-01-1-01', 0, 8, d)).toBe('K-01-1-01');
    expect(type('K-02-3-04', 5000, 8, d)).toBe('K-02-3-04');
  });

  it('replaces what the field held with the scanned code', () => {
    expect(afterScan('K-01-1-01K-02-3-04', 'K-02-3-04')).toBe('K-02-3-04');
    expect(afterScan('typed by hand', 'OTHER')).toBe('typed by hand');
  });
});
