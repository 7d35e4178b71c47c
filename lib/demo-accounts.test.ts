import { describe, expect, it } from 'vitest';
import { isLoopbackHost } from './demo-accounts';

describe('isLoopbackHost', () => {
  // 127.0.0.0/8 and ::1 are loopback (RFC 1122 §3.2.1.3, RFC 4291 §2.5.3).
  it.each(['127.0.0.1', '127.1.2.3', 'localhost', '::1', '[::1]', ' LOCALHOST '])('%s is loopback', (h) => expect(isLoopbackHost(h)).toBe(true));
  it.each(['0.0.0.0', '::', '192.168.1.20', '10.0.0.5', 'tallyforge.example', '127.0.0.1.example', ''])('%s is not', (h) =>
    expect(isLoopbackHost(h)).toBe(false),
  );
});
