/**
 * A first-order approach to a new value, as a load cell and its filter settle:
 * v(t) = target + (v(t0) − target)·e^(−(t − t0)/τ).
 */
export class FirstOrderLag {
  private from = 0;
  private target = 0;
  private since = 0;

  constructor(private readonly tauMs: number) {}

  valueAt(t: number): number {
    const elapsed = Math.max(0, t - this.since);
    return this.target + (this.from - this.target) * Math.exp(-elapsed / this.tauMs);
  }

  /** Start moving towards `target` at time t, from wherever the value is now. */
  setTarget(t: number, target: number): void {
    this.from = this.valueAt(t);
    this.since = t;
    this.target = target;
  }

  /** Distance still to go at time t. */
  remainingAt(t: number): number {
    return Math.abs(this.valueAt(t) - this.target);
  }
}
