/**
 * A deterministic simulated scale for the bench and the Monte Carlo checks.
 * The indication approaches each new load with a first-order lag (time constant τ),
 * drifts slowly, carries Gaussian repeatability noise s_r and is rounded to d.
 * Time only moves when told to (advance / tick), so tests need no timers.
 */
import { roundToStep } from '../weighing/round';
import { FirstOrderLag } from './first-order-lag';
import { createRandom, type Random } from './prng';
import { createReadingHub, type Reading, type ReadingListener } from './reading';
import { createPartSupply, type PartSupply, type VirtualPart } from './virtual-parts';

export interface SimulatedScaleOptions {
  seed: number;
  /** Max, grams; the indication stops at Max + 9 d. */
  capacity: number;
  /** Division d, grams. */
  division: number;
  /** Repeatability s_r, grams (default 0: rounding only). */
  repeatability?: number;
  /** Settling time constant τ, ms (default 200). */
  settleMs?: number;
  /** Zero drift, grams per minute (default 0). */
  driftPerMinute?: number;
  /** Readings per second emitted by tick (default 10). */
  rateHz?: number;
  part?: VirtualPart;
  /** Add the scale's own stability flag to readings (default false). */
  reportStable?: boolean;
}

export class SimulatedScale {
  readonly options: Required<Omit<SimulatedScaleOptions, 'part'>>;
  private readonly noise: Random;
  private supply: PartSupply | null;
  private readonly hub = createReadingHub();
  private pieces: number[] = [];
  private container = 0;
  private load = 0;
  private clock = 0;
  private nextAt = 0;
  private readonly lag: FirstOrderLag;
  private zeroOffset = 0;

  constructor(options: SimulatedScaleOptions) {
    this.options = {
      repeatability: 0,
      settleMs: 200,
      driftPerMinute: 0,
      rateHz: 10,
      reportStable: false,
      ...options,
    };
    this.nextAt = 1000 / this.options.rateHz; // tick(ms) emits in (now, now + ms]
    this.lag = new FirstOrderLag(this.options.settleMs);
    this.noise = createRandom(options.seed);
    // A separate stream for parts: changing the reading rate does not change the pieces.
    this.supply = options.part ? createPartSupply(options.part, createRandom(options.seed ^ 0x9e3779b9)) : null;
  }

  now(): number {
    return this.clock;
  }
  /** True load on the pan, grams: pieces plus container. */
  trueLoad(): number {
    return this.load;
  }
  pieceCount(): number {
    return this.pieces.length;
  }
  setPart(part: VirtualPart): void {
    // Seeded from the noise stream, so a run stays reproducible.
    this.supply = createPartSupply(part, createRandom(Math.floor(this.noise.next() * 2 ** 32)));
  }

  /** Put n new pieces on the pan; returns their weights. */
  addPieces(n: number): number[] {
    if (!this.supply) throw new Error('SimulatedScale: no part configured');
    const added = Array.from({ length: n }, () => this.supply!.draw());
    this.changeLoad(() => {
      for (const w of added) this.pieces.push(w);
    });
    return added;
  }
  /** Take the last n pieces off the pan; returns their weights. */
  removePieces(n: number): number[] {
    let removed: number[] = [];
    this.changeLoad(() => {
      removed = this.pieces.splice(Math.max(0, this.pieces.length - n), n);
    });
    return removed;
  }
  placeContainer(weight: number): void {
    this.changeLoad(() => (this.container = weight));
  }
  removeContainer(): void {
    this.changeLoad(() => (this.container = 0));
  }
  clearPan(): void {
    this.changeLoad(() => {
      this.pieces = [];
      this.container = 0;
    });
  }

  /** Set the indication to zero at the current (settling, drifting) value. */
  zero(): void {
    this.zeroOffset = this.lag.valueAt(this.clock) + this.drift(this.clock);
  }

  /** Move the clock without emitting readings. */
  advance(ms: number): void {
    this.clock += ms;
    const period = 1000 / this.options.rateHz;
    if (this.nextAt <= this.clock) this.nextAt += (Math.floor((this.clock - this.nextAt) / period) + 1) * period;
  }

  /** One reading at the current time. */
  readNow(): Reading {
    const { division, repeatability, reportStable } = this.options;
    const value = this.lag.valueAt(this.clock) + this.drift(this.clock) - this.zeroOffset;
    // Indicators show nothing above Max + 9 e (OIML R 76-1 4.2.3; from memory): hold the reading there.
    const top = this.options.capacity + 9 * division;
    const gross = Math.min(top, roundToStep(value + repeatability * this.noise.normal(), division) || 0);
    const reading: Reading = { t: this.clock, gross, unit: 'g' };
    // The scale's own motion check: the lag has closed to within a quarter division, and not overloaded.
    if (reportStable) reading.stable = this.lag.remainingAt(this.clock) < division / 4 && gross < top;
    return reading;
  }

  /** Move the clock by ms, emitting readings at the configured rate; returns them too. */
  tick(ms: number): Reading[] {
    const end = this.clock + ms;
    const period = 1000 / this.options.rateHz;
    const out: Reading[] = [];
    while (this.nextAt <= end) {
      this.clock = this.nextAt;
      this.nextAt += period;
      const reading = this.readNow();
      out.push(reading);
      this.hub.emit(reading);
    }
    this.clock = end;
    return out;
  }

  subscribe(listener: ReadingListener): () => void {
    return this.hub.subscribe(listener);
  }

  private drift(t: number): number {
    return (this.options.driftPerMinute * t) / 60000;
  }
  private changeLoad(change: () => void): void {
    change();
    this.load = this.pieces.reduce((sum, w) => sum + w, 0) + this.container;
    this.lag.setTarget(this.clock, this.load);
  }
}
