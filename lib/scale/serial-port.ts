/**
 * The part of the Web Serial API's SerialPort that Tallyforge uses (WICG Web Serial draft):
 * a real navigator.serial port satisfies it, and so does a test fake built on web streams.
 */
export interface SerialSettings {
  baudRate: number;
  dataBits?: 7 | 8;
  parity?: 'none' | 'even' | 'odd';
  stopBits?: 1 | 2;
}

export interface SerialPortLike {
  open(options: SerialSettings): Promise<void>;
  close(): Promise<void>;
  readonly readable: ReadableStream<Uint8Array> | null;
  readonly writable: WritableStream<Uint8Array> | null;
}
