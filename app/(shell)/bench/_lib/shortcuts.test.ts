import { describe, expect, it } from 'vitest';
import { SHORTCUTS, shortcutFor } from './shortcuts';

const press = (key: string, target: unknown = null, mods = {}) => ({
  key,
  ctrlKey: false,
  metaKey: false,
  altKey: false,
  target: target as EventTarget | null,
  ...mods,
});

describe('bench shortcuts', () => {
  it('maps each key to one step and every step to its own key', () => {
    expect(shortcutFor(press('T'))).toBe('tare');
    expect(new Set(Object.values(SHORTCUTS)).size).toBe(Object.keys(SHORTCUTS).length);
  });

  it('ignores keys typed into a text field, such as a scanned part number', () => {
    expect(shortcutFor(press('c', { tagName: 'INPUT', type: 'text' }))).toBeNull();
    expect(shortcutFor(press('c', { tagName: 'BUTTON' }))).toBe('capture');
  });

  it('ignores keys with a modifier', () => {
    expect(shortcutFor(press('c', null, { ctrlKey: true }))).toBeNull();
  });
});
