import { describe, expect, it } from 'vitest';
import { allowedActions, captureDone, move, type BenchEvent } from './bench-machine';
import { startWork, type BenchWork } from './bench-work';

const part = { partId: 7, partNumber: 'SC-4', label: 'SC-4 screw', scaleId: 3 };
const fresh = (purpose: BenchWork['purpose'] = 'part') => startWork({ ...part, purpose });

function go(work: BenchWork, ...events: BenchEvent[]): BenchWork {
  return events.reduce((w, e) => {
    const m = move(w, e);
    if (!m.ok) throw new Error(`refused ${e.action}: ${m.reason}`);
    return m.work;
  }, work);
}

const tared = () => go(fresh(), { action: 'tare', stableGross: 150, containerId: 2 });
const sampled = () => go(tared(), { action: 'sample', quantity: 10, stableGross: 175 });

describe('the bench state machine', () => {
  it('allows each step its own actions and nothing without work', () => {
    expect(allowedActions(null)).toEqual([]);
    expect(allowedActions(fresh())).toEqual(['tare', 'presetTare']);
    expect(allowedActions(tared())).toEqual(['sample', 'piece', 'finishPieces']);
    expect(allowedActions(sampled())).toEqual(['grow', 'count']);
    expect(allowedActions(go(sampled(), { action: 'count' }))).toEqual(['capture']);
    expect(allowedActions(captureDone(go(sampled(), { action: 'count' })))).toEqual(['next']);
  });

  it('refuses an action from another step, saying which step the bench is at', () => {
    const m = move(fresh(), { action: 'capture', makeKey: () => 'k' });
    expect(m).toEqual({ ok: false, reason: expect.stringMatching(/taring the container/) });
    expect(move(sampled(), { action: 'tare', stableGross: 1, containerId: null }).ok).toBe(false);
  });

  it('tare: from the stable reading, or preset from the container', () => {
    expect(tared()).toMatchObject({ step: 'sample', tare: 150, containerId: 2 });
    expect(go(fresh(), { action: 'presetTare', containerId: 4, containerTare: 212.5 })).toMatchObject({ step: 'sample', tare: 212.5, containerId: 4 });
  });

  it('sample: needs a whole quantity and something on the pan; a bin goes straight to counting', () => {
    expect(sampled()).toMatchObject({ step: 'grow', sample: { quantity: 10, netWeight: 25 } });
    expect(move(tared(), { action: 'sample', quantity: 10, stableGross: 150 })).toMatchObject({ ok: false, reason: expect.stringMatching(/Nothing is on the pan/) });
    expect(move(tared(), { action: 'sample', quantity: 2.5, stableGross: 175 })).toMatchObject({ ok: false, reason: expect.stringMatching(/whole number/) });
    const bin = go(fresh('bin'), { action: 'tare', stableGross: 0, containerId: null }, { action: 'sample', quantity: 20, stableGross: 50 });
    expect(bin.step).toBe('count');
  });

  it('piece and finishPieces: one piece more each time, at least two before the sample closes', () => {
    const one = go(tared(), { action: 'piece', stableGross: 152.5, division: 0.1 });
    expect(move(one, { action: 'piece', stableGross: 152.52, division: 0.1 })).toMatchObject({ ok: false, reason: expect.stringMatching(/No new piece/) });
    expect(move(one, { action: 'finishPieces' })).toMatchObject({ ok: false, reason: expect.stringMatching(/at least two/) });
    const closed = go(one, { action: 'piece', stableGross: 155.1, division: 0.1 }, { action: 'finishPieces' });
    expect(closed).toMatchObject({ step: 'grow', sample: { quantity: 2, netWeight: expect.closeTo(5.1, 9) } });
  });

  it('grow: only a larger sample; count: on to counting with the sample kept', () => {
    const grown = go(sampled(), { action: 'grow', sample: { quantity: 30, netWeight: 75 } });
    expect(grown).toMatchObject({ step: 'grow', sample: { quantity: 30 } });
    expect(move(grown, { action: 'grow', sample: { quantity: 30, netWeight: 75 } })).toMatchObject({ ok: false, reason: expect.stringMatching(/No pieces were added/) });
    expect(go(grown, { action: 'count' })).toMatchObject({ step: 'count', sample: { quantity: 30 } });
  });

  it('capture: the key is made once and kept for retries; done after the server (or the queue) took it', () => {
    let n = 0;
    const makeKey = () => `key-${++n}`;
    const counting = go(sampled(), { action: 'count' });
    const once = go(counting, { action: 'capture', makeKey });
    const again = go(once, { action: 'capture', makeKey });
    expect(again.captureKey).toBe('key-1');
    expect(captureDone(again).step).toBe('captured');
    expect(captureDone(tared()).step).toBe('sample');
  });

  it('next: a new count of the same part with a new key and container, target kept', () => {
    const done = captureDone(go(sampled(), { action: 'count' }, { action: 'capture', makeKey: () => 'k' }));
    const next = go({ ...done, targetQuantity: 40 }, { action: 'next' });
    expect(next).toMatchObject({ step: 'tare', captureKey: null, containerId: null, targetQuantity: 40, partId: 7 });
  });
});
