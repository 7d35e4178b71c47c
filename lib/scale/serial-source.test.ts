import { describe, expect, it } from 'vitest';
import { findLineProfile } from './line-format';
import type { Reading } from './reading';
import { createSerialSource, type SerialPortLike, type SerialSettings } from './serial-source';

/** A stand-in for a Web Serial port: bytes in through a ReadableStream, writes collected. */
function fakePort() {
  let feed!: ReadableStreamDefaultController<Uint8Array>;
  const written: string[] = [];
  const state = { opened: null as SerialSettings | null, closed: false };
  const port: SerialPortLike & { send(text: string): void; end(): void } = {
    readable: new ReadableStream<Uint8Array>({ start: (c) => void (feed = c) }),
    writable: new WritableStream<Uint8Array>({ write: (chunk) => void written.push(new TextDecoder().decode(chunk)) }),
    open: async (settings) => void (state.opened = settings),
    close: async () => void (state.closed = true),
    send: (text) => feed.enqueue(new TextEncoder().encode(text)),
    end: () => feed.close(),
  };
  return { port, written, state };
}

const flush = () => new Promise((resolve) => setTimeout(resolve, 0));
const profile = findLineProfile('signed-unit-flag')!;

describe('createSerialSource', () => {
  it('opens the port with its settings and streams parsed readings', async () => {
    const { port, state } = fakePort();
    let clock = 1000;
    const source = createSerialSource({ port, settings: { baudRate: 9600, parity: 'even', dataBits: 7 }, profile, now: () => clock++ });
    const got: Reading[] = [];
    source.subscribe((r) => got.push(r));
    await source.start();
    expect(state.opened).toEqual({ baudRate: 9600, dataBits: 7, parity: 'even', stopBits: 1 });
    port.send('@ +0012.3');
    port.send('4 g\r\n~ -0000.50 kg\r');
    port.send('\n');
    await flush();
    expect(got).toEqual([
      { t: 1000, gross: 12.34, unit: 'g', stable: true },
      { t: 1001, gross: -0.5, unit: 'kg', stable: false },
    ]);
    await source.stop();
    expect(state.closed).toBe(true);
    expect(source.kind).toBe('serial');
  });

  it('counts malformed lines and keeps going', async () => {
    const { port } = fakePort();
    const source = createSerialSource({ port, settings: { baudRate: 9600 }, profile });
    const got: Reading[] = [];
    source.subscribe((r) => got.push(r));
    await source.start();
    port.send('garbage\r\n@ +0001.00 ct\r\n' + 'z'.repeat(200) + '\r\n@ +0001.00 g\r\n');
    await flush();
    expect(got).toHaveLength(1);
    expect(source.stats()).toMatchObject({ lines: 3, accepted: 1, malformed: 3, rejects: { no_match: 1, unknown_unit: 1 } });
    await source.stop();
  });

  it('sends the request string at its rate when polled', async () => {
    const { port, written } = fakePort();
    const source = createSerialSource({
      port,
      settings: { baudRate: 2400 },
      profile,
      mode: { kind: 'polled', request: '?\r\n', intervalMs: 10 },
    });
    await source.start();
    await new Promise((resolve) => setTimeout(resolve, 55));
    await source.stop();
    expect(written.length).toBeGreaterThanOrEqual(3);
    expect(new Set(written)).toEqual(new Set(['?\r\n']));
    const count = written.length;
    await new Promise((resolve) => setTimeout(resolve, 30));
    expect(written.length).toBe(count);
  });

  it('offers tare and zero only when the site configured their commands', async () => {
    const { port, written } = fakePort();
    const plain = createSerialSource({ port, settings: { baudRate: 9600 }, profile });
    expect(plain.tare).toBeUndefined();
    const withTare = createSerialSource({ port, settings: { baudRate: 9600 }, profile, commands: { tare: 'T\r\n' } });
    await withTare.start();
    await withTare.tare!();
    expect(written).toEqual(['T\r\n']);
    expect(withTare.zero).toBeUndefined();
    await withTare.stop();
  });

  it('stops cleanly when the scale ends the stream', async () => {
    const { port } = fakePort();
    const source = createSerialSource({ port, settings: { baudRate: 9600 }, profile });
    await source.start();
    port.end();
    await flush();
    await expect(source.stop()).resolves.toBeUndefined();
  });
});
