import { describe, expect, it } from 'vitest';
import { TraceBuffer } from './trace-buffer';

describe('TraceBuffer', () => {
  it('returns the readings of a time window oldest first', () => {
    const trace = new TraceBuffer(10);
    for (let i = 0; i < 5; i += 1) trace.append(i * 50, i);
    const w = trace.window(50, 150);
    expect(Array.from(w.t)).toEqual([50, 100, 150]);
    expect(Array.from(w.gross)).toEqual([1, 2, 3]);
  });

  it('drops the oldest readings once full and keeps the order across the wrap', () => {
    const trace = new TraceBuffer(4);
    for (let i = 0; i < 7; i += 1) trace.append(i, i * 10);
    expect(trace.size()).toBe(4);
    expect(trace.oldestTime()).toBe(3);
    expect(trace.newestTime()).toBe(6);
    expect(Array.from(trace.window(0, 100).gross)).toEqual([30, 40, 50, 60]);
  });

  it('keeps marks for tare, sample and capture', () => {
    const trace = new TraceBuffer(4);
    trace.mark(12, 'tare', 'Tare');
    expect(trace.marks).toEqual([{ t: 12, kind: 'tare', label: 'Tare' }]);
  });

  it('refuses a capacity below 2', () => {
    expect(() => new TraceBuffer(1)).toThrow(RangeError);
  });
});
