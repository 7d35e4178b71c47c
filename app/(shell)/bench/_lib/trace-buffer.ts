/**
 * The live trace's memory: a ring of (t, gross) pairs in typed arrays, so appending one
 * reading costs O(1) and no allocation; the oldest readings fall off once it is full.
 */
export type TraceMarkKind = 'tare' | 'sample' | 'grow' | 'capture';

export interface TraceMark {
  t: number;
  kind: TraceMarkKind;
  label: string;
}

export interface TraceWindow {
  t: Float64Array;
  gross: Float64Array;
}

export class TraceBuffer {
  readonly capacity: number;
  private readonly times: Float64Array;
  private readonly values: Float64Array;
  private head = 0; // next write position
  private count = 0;
  readonly marks: TraceMark[] = [];

  constructor(capacity: number) {
    if (!Number.isInteger(capacity) || capacity < 2) throw new RangeError('TraceBuffer: capacity must be a whole number of at least 2');
    this.capacity = capacity;
    this.times = new Float64Array(capacity);
    this.values = new Float64Array(capacity);
  }

  append(t: number, gross: number): void {
    this.times[this.head] = t;
    this.values[this.head] = gross;
    this.head = (this.head + 1) % this.capacity;
    if (this.count < this.capacity) this.count += 1;
  }

  mark(t: number, kind: TraceMarkKind, label: string): void {
    this.marks.push({ t, kind, label });
  }

  size(): number {
    return this.count;
  }

  oldestTime(): number | undefined {
    return this.count === 0 ? undefined : this.times[this.index(0)];
  }

  newestTime(): number | undefined {
    return this.count === 0 ? undefined : this.times[this.index(this.count - 1)];
  }

  /** Readings with from ≤ t ≤ to, oldest first, copied out (the chart keeps its own arrays). */
  window(from: number, to: number): TraceWindow {
    const start = this.firstAtOrAfter(from);
    let end = start;
    while (end < this.count && this.times[this.index(end)] <= to) end += 1;
    const t = new Float64Array(end - start);
    const gross = new Float64Array(end - start);
    for (let i = start; i < end; i += 1) {
      t[i - start] = this.times[this.index(i)];
      gross[i - start] = this.values[this.index(i)];
    }
    return { t, gross };
  }

  /** i-th oldest reading → array position. */
  private index(i: number): number {
    return (this.head - this.count + i + this.capacity) % this.capacity;
  }

  // Times only grow, so the ring in age order is sorted: binary search.
  private firstAtOrAfter(from: number): number {
    let lo = 0;
    let hi = this.count;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (this.times[this.index(mid)] < from) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  }
}
