import { LINE_PROFILES } from '@/lib/scale/line-format';
import type { AccuracyClass } from '@/lib/metrology/accuracy-class';
import type { ScaleConnection } from '@/lib/contracts/scale-connection';
import type { ScaleDto } from '@/lib/contracts/scales';

// The profile form keeps every input as text in one flat object; these turn it into the API body
// and back, and map the server's nested field names ("connection.baudRate") onto the inputs.
export const CONNECTION_KINDS = [
  ['simulator', 'Simulator (training and demos)'],
  ['serial', 'Serial line (Web Serial)'],
  ['raw_adc', 'Raw load-cell converter'],
  ['keyed', 'Weights keyed in by hand'],
] as const;
export type ConnectionKind = (typeof CONNECTION_KINDS)[number][0];

export const BAUD_RATES = [1200, 2400, 4800, 9600, 19200, 38400, 57600, 115200];

export interface ProfileValues {
  name: string;
  location: string;
  capacity: string;
  division: string;
  verificationInterval: string;
  accuracyClass: AccuracyClass;
  minLoad: string;
  repeatability: string;
  kind: ConnectionKind;
  baudRate: string;
  dataBits: string;
  parity: 'none' | 'even' | 'odd';
  stopBits: string;
  lineFormat: string;
  mode: 'continuous' | 'polled';
  pollRequest: string;
  pollIntervalMs: string;
  bits: string;
  fullScaleVolts: string;
  gain: string;
  averaging: string;
  reversedExcitation: boolean;
}

const text = (v: number | null | undefined) => (v === null || v === undefined ? '' : String(v));

export function profileValues(scale?: ScaleDto): ProfileValues {
  const c = scale?.connection;
  return {
    name: scale?.name ?? '',
    location: scale?.location ?? '',
    capacity: text(scale?.capacity),
    division: text(scale?.division),
    verificationInterval: text(scale?.verificationInterval),
    accuracyClass: scale?.accuracyClass ?? 'III',
    minLoad: text(scale?.minLoad),
    repeatability: text(scale?.repeatability),
    kind: c?.kind ?? 'simulator',
    baudRate: c?.kind === 'serial' ? String(c.baudRate) : '9600',
    dataBits: c?.kind === 'serial' ? String(c.dataBits) : '8',
    parity: c?.kind === 'serial' ? c.parity : 'none',
    stopBits: c?.kind === 'serial' ? String(c.stopBits) : '1',
    lineFormat: c?.kind === 'serial' ? c.lineFormat : LINE_PROFILES[0].name,
    mode: c?.kind === 'serial' ? c.mode : 'continuous',
    pollRequest: c?.kind === 'serial' ? (c.pollRequest ?? '') : '',
    pollIntervalMs: c?.kind === 'serial' ? String(c.pollIntervalMs) : '200',
    bits: c?.kind === 'raw_adc' ? String(c.bits) : '24',
    fullScaleVolts: c?.kind === 'raw_adc' ? String(c.fullScaleVolts) : '',
    gain: c?.kind === 'raw_adc' ? String(c.gain) : '128',
    averaging: c?.kind === 'raw_adc' ? String(c.averaging) : '1',
    reversedExcitation: c?.kind === 'raw_adc' ? c.reversedExcitation : false,
  };
}

const num = (v: string) => Number(v);
const optional = (v: string) => (v.trim() === '' ? undefined : Number(v));

// A simulator keeps the settings it had (or the server's defaults): they are not operator-facing.
function connectionBody(v: ProfileValues, previous?: ScaleConnection): ScaleConnection {
  switch (v.kind) {
    case 'simulator':
      return previous?.kind === 'simulator' ? previous : ({ kind: 'simulator' } as ScaleConnection);
    case 'serial':
      return {
        kind: 'serial',
        baudRate: num(v.baudRate),
        dataBits: num(v.dataBits) as 7 | 8,
        parity: v.parity,
        stopBits: num(v.stopBits) as 1 | 2,
        lineFormat: v.lineFormat,
        mode: v.mode,
        pollRequest: v.mode === 'polled' && v.pollRequest ? v.pollRequest : undefined,
        pollIntervalMs: num(v.pollIntervalMs),
      };
    case 'raw_adc':
      return {
        kind: 'raw_adc',
        bits: num(v.bits),
        fullScaleVolts: num(v.fullScaleVolts),
        gain: num(v.gain),
        averaging: num(v.averaging),
        reversedExcitation: v.reversedExcitation,
      };
    case 'keyed':
      return { kind: 'keyed' };
  }
}

export function profileBody(v: ProfileValues, previous?: ScaleDto) {
  return {
    name: v.name,
    location: v.location.trim() || null,
    unit: 'g' as const,
    capacity: num(v.capacity),
    division: num(v.division),
    verificationInterval: optional(v.verificationInterval),
    accuracyClass: v.accuracyClass,
    minLoad: optional(v.minLoad),
    repeatability: v.repeatability.trim() === '' ? null : Number(v.repeatability),
    connection: connectionBody(v, previous?.connection),
  };
}

export function profileFieldErrors(fields: Record<string, string>): Record<string, string> {
  return Object.fromEntries(Object.entries(fields).map(([key, message]) => [key.replace(/^connection\./, '').replace(/^connection$/, 'kind'), message]));
}
