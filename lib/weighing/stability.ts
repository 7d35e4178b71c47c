/**
 * Motion detection (docs/counting-model.md, "Stability and raw load-cell input"), tuned to the
 * scale's own noise and with hysteresis: a full window settles when every reading lies within
 * ±max(d, 3σ) of its mean, and stays settled until one leaves ±max(2d, 5σ), where σ is a reading's
 * noise, √(s_r² + d²/12), with s_r the repeatability quality measured on the scale (its calibration
 * record). A still pan whose readings wander by a division or two therefore stays settled; a piece
 * put on is caught at once. The window's own scatter is not used to widen the bands: on a moving
 * load it would hide the very motion the bands are there to catch.
 * The scale's own stability flag counts too. Incremental: running sum plus monotonic min/max
 * queues, O(1) amortised per reading, so a 50 Hz stream costs nothing on the bench.
 */
import { SlidingWindow } from './sliding-window';

export const DEFAULT_STABILITY_WINDOW_MS: number = 1000;

export interface StabilityOptions {
  /** Division d, in the readings' unit. */
  division: number;
  /** Repeatability s_r of one reading, same unit; 0 or absent when unknown. */
  repeatability?: number;
  windowMs?: number;
}

/** Settle within this many standard deviations of a reading's noise; stay settled within STAY_SETTLED_SIGMAS. */
export const SETTLE_SIGMAS: number = 3;
export const STAY_SETTLED_SIGMAS: number = 5;

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

/**
 * The same rule on one window of values, written out plainly (the detector keeps it incrementally):
 * for checks of the detector and for captures judged after the fact.
 */
export function isWindowStable(values: readonly number[], scale: { division: number; repeatability?: number }, wasSettled = false): boolean {
  if (values.length === 0) return false;
  const mean = values.reduce((sum, v) => sum + v, 0) / values.length;
  const sigma = Math.sqrt((scale.repeatability ?? 0) ** 2 + scale.division ** 2 / 12);
  const band = wasSettled ? Math.max(2 * scale.division, STAY_SETTLED_SIGMAS * sigma) : Math.max(scale.division, SETTLE_SIGMAS * sigma);
  return values.every((v) => Math.abs(v - mean) <= band * (1 + 1e-9));
}

export class StabilityDetector {
  private readonly division: number;
  private readonly noise: number;
  private readonly windowMs: number;
  private window = new SlidingWindow();
  private settled = false;
  private evicted = false;
  private last: StabilityState = { stable: false, mean: NaN, span: 0, samples: 0, full: false, source: null };

  constructor(options: StabilityOptions) {
    this.division = options.division;
    this.noise = Math.sqrt((options.repeatability ?? 0) ** 2 + options.division ** 2 / 12);
    this.windowMs = options.windowMs ?? DEFAULT_STABILITY_WINDOW_MS;
  }

  /** Forget the history, e.g. after a tare or when the clock goes backwards. */
  reset(): void {
    this.window = new SlidingWindow();
    this.evicted = false;
    this.settled = false;
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
    const band = this.settled ? Math.max(2 * this.division, STAY_SETTLED_SIGMAS * this.noise) : Math.max(this.division, SETTLE_SIGMAS * this.noise);
    const tolerance = band * (1 + 1e-9); // readings are multiples of d: keep the band's edge inclusive
    const windowStable = full && max - mean <= tolerance && mean - min <= tolerance;
    this.settled = windowStable;
    const source = windowStable ? 'window' : reading.stable === true ? 'scale' : null;
    this.last = { stable: source !== null, mean, span: max - min, samples: this.window.size(), full, source };
    return this.last;
  }

  state(): StabilityState {
    return this.last;
  }
}
