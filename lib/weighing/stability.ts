/**
 * Motion detection (docs/counting-model.md, "Stability and raw load-cell input"): stable when every reading of the last
 * window lies within ±1 d of the window mean, or when the scale flags stability itself.
 * Incremental: running sum plus monotonic min/max queues, O(1) amortised per reading,
 * so a 50 Hz stream costs nothing on the bench.
 */
import { SlidingWindow } from './sliding-window';

export const DEFAULT_STABILITY_WINDOW_MS: number = 1000;

export interface StabilityOptions {
  /** Division d, in the readings' unit. */
  division: number;
  windowMs?: number;
}

export interface StabilityInput {
  t: number;
  gross: number;
  stable?: boolean;
}

export interface StabilityState {
  stable: boolean;
  /** Mean of the window: the value a capture should use. */
  mean: number;
  /** Largest − smallest reading in the window. */
  span: number;
  samples: number;
  /** The readings cover the whole window (a reading has left it, or the oldest is windowMs old). */
  full: boolean;
  /** What decided stability: our window, the scale's own flag, or neither. */
  source: 'window' | 'scale' | null;
}

/** Plain check of one window of values, for captures and tests. */
export function isWindowStable(values: readonly number[], division: number): boolean {
  if (values.length === 0) return false;
  const mean = values.reduce((sum, v) => sum + v, 0) / values.length;
  const tolerance = division * (1 + 1e-9); // readings are multiples of d; keep ±1 d inclusive
  return values.every((v) => Math.abs(v - mean) <= tolerance);
}

export class StabilityDetector {
  private readonly division: number;
  private readonly windowMs: number;
  private window = new SlidingWindow();
  private evicted = false;
  private last: StabilityState = { stable: false, mean: NaN, span: 0, samples: 0, full: false, source: null };

  constructor(options: StabilityOptions) {
    this.division = options.division;
    this.windowMs = options.windowMs ?? DEFAULT_STABILITY_WINDOW_MS;
  }

  /** Forget the history, e.g. after a tare or when the clock goes backwards. */
  reset(): void {
    this.window = new SlidingWindow();
    this.evicted = false;
    this.last = { stable: false, mean: NaN, span: 0, samples: 0, full: false, source: null };
  }

  push(reading: StabilityInput): StabilityState {
    const newest = this.window.newestTime();
    if (newest !== undefined && reading.t < newest) this.reset();
    this.window.push(reading.t, reading.gross);
    if (this.window.evictBefore(reading.t - this.windowMs) > 0) this.evicted = true;
    const mean = this.window.mean();
    const min = this.window.min();
    const max = this.window.max();
    const oldest = this.window.oldestTime() ?? reading.t;
    const full = this.evicted || reading.t - oldest >= this.windowMs;
    const tolerance = this.division * (1 + 1e-9);
    const windowStable = full && max - mean <= tolerance && mean - min <= tolerance;
    const source = windowStable ? 'window' : reading.stable === true ? 'scale' : null;
    this.last = { stable: source !== null, mean, span: max - min, samples: this.window.size(), full, source };
    return this.last;
  }

  state(): StabilityState {
    return this.last;
  }
}
