import { describe, expect, it } from 'vitest';
import { addressListForLog } from './address-list';

describe('addressListForLog', () => {
  it('keeps a short list as it is', () => {
    expect(addressListForLog(['a@x.test', 'b@x.test'])).toBe('a@x.test, b@x.test');
  });

  it('names as many recipients as fit and counts the rest', () => {
    const to = Array.from({ length: 100 }, (_, i) => `person-${String(i).padStart(3, '0')}@example.test`);
    const text = addressListForLog(to);
    expect(text.length).toBeLessThanOrEqual(1000);
    const named = text.split(', ').filter((p) => p.includes('@'));
    expect(named).toEqual(to.slice(0, named.length));
    expect(text.endsWith(`and ${100 - named.length} more`)).toBe(true);
  });
});
