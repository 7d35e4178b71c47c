/** What every scale connection produces, and the contract a connection offers. */
import type { WeightUnit } from '../weighing/units';

export interface Reading {
  /** Milliseconds on the source's clock. */
  t: number;
  /** Gross indication in `unit`. */
  gross: number;
  unit: WeightUnit;
  /** The scale's own stability flag, when it sends one. */
  stable?: boolean;
  /** Raw converter counts, for a bare load-cell front end. */
  raw?: number;
}

export type ReadingListener = (reading: Reading) => void;

export type ReadingSourceKind = 'serial' | 'raw-adc' | 'simulator' | 'keyed';

export interface ReadingSource {
  readonly kind: ReadingSourceKind;
  start(): Promise<void>;
  stop(): Promise<void>;
  /** Returns a function that unsubscribes. */
  subscribe(listener: ReadingListener): () => void;
  /** Ask the scale to tare, where the connection can. */
  tare?(): Promise<void>;
  /** Ask the scale to set zero, where the connection can. */
  zero?(): Promise<void>;
}

/** Fan-out of readings to listeners; a throwing listener does not stop the others. */
export interface ReadingHub {
  subscribe(listener: ReadingListener): () => void;
  emit(reading: Reading): void;
  size(): number;
}

export function createReadingHub(onListenerError?: (error: unknown) => void): ReadingHub {
  const listeners = new Set<ReadingListener>();
  return {
    subscribe(listener) {
      listeners.add(listener);
      return () => {
        listeners.delete(listener);
      };
    },
    emit(reading) {
      for (const listener of [...listeners]) {
        try {
          listener(reading);
        } catch (error) {
          onListenerError?.(error);
        }
      }
    },
    size: () => listeners.size,
  };
}
