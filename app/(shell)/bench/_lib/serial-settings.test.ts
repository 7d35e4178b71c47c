import { describe, expect, it } from 'vitest';
import { serialSettingsFrom, unescapeRequest } from './serial-settings';

describe('serial settings', () => {
  it('starts from the scale profile and keeps valid workstation overrides only', () => {
    const s = serialSettingsFrom(
      { baudRate: 9600, lineFormat: 'signed-unit-flag' },
      { baudRate: 19200, parity: 'odd', lineFormat: 'no-such-format', stopBits: 3 },
    );
    expect(s).toMatchObject({ baudRate: 19200, parity: 'odd', lineFormat: 'signed-unit-flag', stopBits: 1, dataBits: 8 });
  });

  it('turns typed \\r\\n escapes into line ends', () => {
    expect(unescapeRequest('W\\r\\n')).toBe('W\r\n');
  });
});
