import { describe, expect, it } from 'vitest';
import { safeNextPath } from './safe-next';

describe('the page to go to after signing in', () => {
  it('keeps a path of this app, with its query and fragment', () => {
    expect(safeNextPath('/orders/12?tab=lines#l3')).toBe('/orders/12?tab=lines#l3');
    expect(safeNextPath('/bench')).toBe('/bench');
  });

  // The addresses an attacker tried (as the page receives them, percent-decoded): each landed on
  // another host in Chromium before. WHATWG URL Standard: "\" is "/" in http(s) URLs, and ASCII tab
  // and newline are removed before parsing.
  it.each([
    '/\\evil.test',
    '/\t/evil.test',
    '/\n/evil.test',
    '/\\/evil.test',
    '//evil.test',
    '/ /evil.test'.replace(' ', '\r'),
    'https://evil.test/',
    'javascript:alert(1)',
    'evil.test',
  ])('sends %j to the start page', (next) => {
    const target = safeNextPath(next);
    expect(new URL(target, 'https://app.example').origin).toBe('https://app.example');
  });

  it('never follows an API address or nothing at all', () => {
    expect(safeNextPath('/api/v1/session')).toBe('/');
    expect(safeNextPath(undefined)).toBe('/');
    expect(safeNextPath('')).toBe('/');
  });
});
