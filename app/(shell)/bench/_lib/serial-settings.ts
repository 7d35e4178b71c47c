/** Port settings for a serial scale: the scale's profile, overridden per workstation. */
import { findLineProfile } from '@/lib/scale/line-format';

export interface SerialPortSettings {
  baudRate: number;
  dataBits: 7 | 8;
  parity: 'none' | 'even' | 'odd';
  stopBits: 1 | 2;
  lineFormat: string;
  mode: 'continuous' | 'polled';
  pollRequest: string;
  pollIntervalMs: number;
}

export const BAUD_RATES = [1200, 2400, 4800, 9600, 19200, 38400, 57600, 115200] as const;

export function serialSettingsFrom(profile: Partial<SerialPortSettings>, saved: unknown): SerialPortSettings {
  const base: SerialPortSettings = {
    baudRate: profile.baudRate ?? 9600,
    dataBits: profile.dataBits ?? 8,
    parity: profile.parity ?? 'none',
    stopBits: profile.stopBits ?? 1,
    lineFormat: profile.lineFormat ?? 'plain-grams',
    mode: profile.mode ?? 'continuous',
    pollRequest: profile.pollRequest ?? '',
    pollIntervalMs: profile.pollIntervalMs ?? 200,
  };
  if (!saved || typeof saved !== 'object') return base;
  const s = saved as Partial<SerialPortSettings>;
  return {
    baudRate: BAUD_RATES.includes(s.baudRate as (typeof BAUD_RATES)[number]) ? s.baudRate! : base.baudRate,
    dataBits: s.dataBits === 7 || s.dataBits === 8 ? s.dataBits : base.dataBits,
    parity: s.parity === 'none' || s.parity === 'even' || s.parity === 'odd' ? s.parity : base.parity,
    stopBits: s.stopBits === 1 || s.stopBits === 2 ? s.stopBits : base.stopBits,
    lineFormat: typeof s.lineFormat === 'string' && findLineProfile(s.lineFormat) ? s.lineFormat : base.lineFormat,
    mode: s.mode === 'polled' || s.mode === 'continuous' ? s.mode : base.mode,
    pollRequest: typeof s.pollRequest === 'string' ? s.pollRequest : base.pollRequest,
    pollIntervalMs: typeof s.pollIntervalMs === 'number' && s.pollIntervalMs >= 50 ? s.pollIntervalMs : base.pollIntervalMs,
  };
}

/** "\r" and "\n" as typed in the settings → the control characters sent to the scale. */
export function unescapeRequest(text: string): string {
  return text.replace(/\\r/g, '\r').replace(/\\n/g, '\n');
}
