/**
 * Time-ordered values with O(1) amortised push/evict and window sum, min and max
 * (monotonic queues). Arrays with a moving head, compacted now and then.
 */
class Queue<T> {
  private items: T[] = [];
  private head = 0;

  get length(): number {
    return this.items.length - this.head;
  }
  front(): T | undefined {
    return this.head < this.items.length ? this.items[this.head] : undefined;
  }
  back(): T | undefined {
    return this.length > 0 ? this.items[this.items.length - 1] : undefined;
  }
  pushBack(item: T): void {
    this.items.push(item);
  }
  popBack(): void {
    if (this.length > 0) this.items.pop();
  }
  forEach(fn: (item: T) => void): void {
    for (let i = this.head; i < this.items.length; i += 1) fn(this.items[i]);
  }
  popFront(): void {
    this.head += 1;
    if (this.head > 1024 && this.head * 2 > this.items.length) {
      this.items = this.items.slice(this.head);
      this.head = 0;
    }
  }
}

interface Entry {
  t: number;
  v: number;
  seq: number;
}

export class SlidingWindow {
  private readonly entries = new Queue<Entry>();
  private readonly mins = new Queue<Entry>();
  private readonly maxs = new Queue<Entry>();
  private sum = 0;
  private seq = 0;

  push(t: number, v: number): void {
    const entry = { t, v, seq: this.seq++ };
    this.entries.pushBack(entry);
    this.sum += v;
    while (this.mins.length > 0 && this.mins.back()!.v >= v) this.mins.popBack();
    this.mins.pushBack(entry);
    while (this.maxs.length > 0 && this.maxs.back()!.v <= v) this.maxs.popBack();
    this.maxs.pushBack(entry);
    // Re-add from scratch now and then so rounding in the running sum cannot build up.
    if (this.seq % 4096 === 0) this.resum();
  }

  /** Drop entries older than `cutoff`; returns how many left. */
  evictBefore(cutoff: number): number {
    let dropped = 0;
    while (this.entries.length > 0 && this.entries.front()!.t < cutoff) {
      const gone = this.entries.front()!;
      this.entries.popFront();
      this.sum -= gone.v;
      if (this.mins.front()?.seq === gone.seq) this.mins.popFront();
      if (this.maxs.front()?.seq === gone.seq) this.maxs.popFront();
      dropped += 1;
    }
    return dropped;
  }

  size(): number {
    return this.entries.length;
  }
  mean(): number {
    return this.entries.length > 0 ? this.sum / this.entries.length : NaN;
  }
  min(): number {
    return this.mins.front()?.v ?? NaN;
  }
  max(): number {
    return this.maxs.front()?.v ?? NaN;
  }
  oldestTime(): number | undefined {
    return this.entries.front()?.t;
  }
  newestTime(): number | undefined {
    return this.entries.back()?.t;
  }

  private resum(): void {
    let sum = 0;
    this.entries.forEach((e) => {
      sum += e.v;
    });
    this.sum = sum;
  }
}
