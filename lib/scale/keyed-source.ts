/**
 * A keyed-in weight: the operator types what a scale without a connection shows.
 * Each entry becomes one reading, stable by definition (the operator read a still display).
 */
import type { WeightUnit } from '../weighing/units';
import { createReadingHub, type Reading, type ReadingSource } from './reading';

export interface KeyedSourceOptions {
  unit: WeightUnit;
  now?: () => number;
}

export interface KeyedSource extends ReadingSource {
  readonly kind: 'keyed';
  /** Enter a weight typed by the operator ("12.5" or "12,5" too); returns the reading emitted. */
  enter(weight: number | string): Reading;
}

/** Typed text → number; a decimal comma is accepted, anything else must be a plain number. */
export function readKeyedWeight(text: string): number {
  const cleaned = text.trim().replace(',', '.');
  if (!/^[+-]?(\d+(\.\d*)?|\.\d+)$/.test(cleaned)) throw new RangeError(`not a weight: "${text}"`);
  return Number(cleaned);
}

export function createKeyedSource(options: KeyedSourceOptions): KeyedSource {
  const now = options.now ?? (() => Date.now());
  const hub = createReadingHub();
  let running = false;
  return {
    kind: 'keyed',
    async start() {
      running = true;
    },
    async stop() {
      running = false;
    },
    subscribe: (listener) => hub.subscribe(listener),
    enter(weight) {
      const gross = typeof weight === 'string' ? readKeyedWeight(weight) : weight;
      if (!Number.isFinite(gross)) throw new RangeError('weight must be a finite number');
      if (!running) throw new Error('keyed source is not started');
      const reading: Reading = { t: now(), gross, unit: options.unit, stable: true };
      hub.emit(reading);
      return reading;
    },
  };
}
