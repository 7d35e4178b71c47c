import { describe, expect, it } from 'vitest';
import { createReadingHub, type Reading } from './reading';

const reading: Reading = { t: 1, gross: 2.5, unit: 'g' };

describe('createReadingHub', () => {
  it('delivers each reading to every listener until it unsubscribes', () => {
    const hub = createReadingHub();
    const a: Reading[] = [];
    const b: Reading[] = [];
    const stopA = hub.subscribe((r) => a.push(r));
    hub.subscribe((r) => b.push(r));
    hub.emit(reading);
    stopA();
    hub.emit({ ...reading, t: 2 });
    expect(a.map((r) => r.t)).toEqual([1]);
    expect(b.map((r) => r.t)).toEqual([1, 2]);
    expect(hub.size()).toBe(1);
  });

  it('keeps delivering to the others when one listener throws', () => {
    const errors: unknown[] = [];
    const hub = createReadingHub((e) => errors.push(e));
    const got: Reading[] = [];
    hub.subscribe(() => {
      throw new Error('listener broke');
    });
    hub.subscribe((r) => got.push(r));
    hub.emit(reading);
    expect(got).toHaveLength(1);
    expect(errors).toHaveLength(1);
  });
});
