/**
 * The simulated scale as a ReadingSource on real timers, for the browser bench.
 * Each timer tick moves the simulator's clock by the wall time that passed.
 */
import type { ReadingSource } from './reading';
import type { SimulatedScale } from './simulator';

export interface SimulatorSourceOptions {
  /** Timer period, ms (default: one reading period of the scale). */
  intervalMs?: number;
  /** Wall clock, ms (default Date.now); injectable for tests. */
  now?: () => number;
}

export interface SimulatorSource extends ReadingSource {
  readonly kind: 'simulator';
  readonly scale: SimulatedScale;
  running(): boolean;
}

export function createSimulatorSource(scale: SimulatedScale, options: SimulatorSourceOptions = {}): SimulatorSource {
  const now = options.now ?? (() => Date.now());
  const intervalMs = options.intervalMs ?? 1000 / scale.options.rateHz;
  let timer: ReturnType<typeof setInterval> | null = null;
  let last = 0;
  const step = (): void => {
    const t = now();
    scale.tick(Math.max(0, t - last));
    last = t;
  };
  return {
    kind: 'simulator',
    scale,
    running: () => timer !== null,
    async start() {
      if (timer !== null) return;
      last = now();
      timer = setInterval(step, intervalMs);
    },
    async stop() {
      if (timer !== null) clearInterval(timer);
      timer = null;
    },
    subscribe: (listener) => scale.subscribe(listener),
    // The simulated indicator keeps no separate tare memory: both set zero.
    async tare() {
      scale.zero();
    },
    async zero() {
      scale.zero();
    },
  };
}
