/**
 * A ReadingSource over a Web Serial port (navigator.serial's SerialPort shape), written
 * against a minimal port interface so tests can hand in a fake with web streams.
 * Continuous scales send lines on their own; polled ones answer a request sent at a rate.
 */
import type { WeightUnit } from '../weighing/units';
import type { LineProfile } from './line-format';
import { LineFramer } from './line-framer';
import { parseLine, type RejectReason } from './parse-line';
import { createReadingHub, type ReadingSource } from './reading';
import type { SerialPortLike, SerialSettings } from './serial-port';

export type { SerialPortLike, SerialSettings } from './serial-port';

export type SerialMode = { kind: 'continuous' } | { kind: 'polled'; request: string; intervalMs: number };

export interface SerialSourceOptions {
  port: SerialPortLike;
  settings: SerialSettings;
  profile: LineProfile;
  mode?: SerialMode;
  /** Strings the scale understands for tare and zero, as configured for the site. */
  commands?: { tare?: string; zero?: string };
  now?: () => number;
  onError?: (error: unknown) => void;
}

export interface SerialStats {
  lines: number;
  accepted: number;
  /** Lines the framer dropped plus lines the profile refused. */
  malformed: number;
  rejects: Partial<Record<RejectReason, number>>;
  lastUnit?: WeightUnit;
}

export interface SerialSource extends ReadingSource {
  readonly kind: 'serial';
  stats(): SerialStats;
}

export function createSerialSource(options: SerialSourceOptions): SerialSource {
  const { port, profile } = options;
  const now = options.now ?? (() => Date.now());
  const hub = createReadingHub(options.onError);
  const stats: SerialStats = { lines: 0, accepted: 0, malformed: 0, rejects: {} };
  let framer = new LineFramer();
  let reader: ReadableStreamDefaultReader<Uint8Array> | null = null;
  let loop: Promise<void> | null = null;
  let poll: ReturnType<typeof setInterval> | null = null;
  let writes: Promise<void> = Promise.resolve();

  const handleLine = (line: string): void => {
    stats.lines += 1;
    const parsed = parseLine(profile, line);
    if (!parsed.ok) {
      stats.rejects[parsed.reason] = (stats.rejects[parsed.reason] ?? 0) + 1;
      return;
    }
    stats.accepted += 1;
    stats.lastUnit = parsed.fields.unit;
    hub.emit({ t: now(), ...parsed.fields });
  };

  const readAll = async (r: ReadableStreamDefaultReader<Uint8Array>): Promise<void> => {
    // stream: true keeps a multi-byte character intact across chunks.
    const decoder = new TextDecoder();
    try {
      for (;;) {
        const { value, done } = await r.read();
        if (done) break;
        framer.push(decoder.decode(value, { stream: true })).forEach(handleLine);
      }
    } catch (error) {
      options.onError?.(error);
    } finally {
      r.releaseLock();
    }
  };

  // One write at a time: a poll and a tare must not fight over the writer lock.
  const send = (text: string): Promise<void> => {
    writes = writes
      .then(async () => {
        if (!port.writable) throw new Error('serial port is not writable');
        const writer = port.writable.getWriter();
        try {
          await writer.write(new TextEncoder().encode(text));
        } finally {
          writer.releaseLock();
        }
      })
      .catch((error: unknown) => options.onError?.(error));
    return writes;
  };

  const source: SerialSource = {
    kind: 'serial',
    stats: () => ({ ...stats, malformed: framer.malformed + stats.lines - stats.accepted, rejects: { ...stats.rejects } }),
    subscribe: (listener) => hub.subscribe(listener),
    async start() {
      if (loop) return;
      await port.open({ dataBits: 8, parity: 'none', stopBits: 1, ...options.settings });
      if (!port.readable) throw new Error('serial port has no readable stream');
      framer = new LineFramer();
      reader = port.readable.getReader();
      loop = readAll(reader);
      const mode = options.mode;
      if (mode?.kind === 'polled') {
        void send(mode.request);
        poll = setInterval(() => void send(mode.request), mode.intervalMs);
      }
    },
    async stop() {
      if (poll !== null) clearInterval(poll);
      poll = null;
      if (!loop) return;
      await reader?.cancel().catch(() => undefined);
      await loop;
      await writes;
      loop = null;
      reader = null;
      await port.close();
    },
  };
  const { tare, zero } = options.commands ?? {};
  if (tare !== undefined) source.tare = () => send(tare);
  if (zero !== undefined) source.zero = () => send(zero);
  return source;
}
