import { describe, expect, it } from 'vitest';
import { allowedActions, canMoveScale, canUseKept, captureDone, move, moveScale, takeKept, type BenchEvent } from './bench-machine';
import { buildCaptureBody } from './capture-request';
import { keepSample, parseKeptSample, parseSavedWork, startWork, type BenchWork } from './bench-work';

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
    expect(move(tared(), { action: 'sample', quantity: 10, stableGross: 150 })).toMatchObject({
      ok: false,
      reason: expect.stringMatching(/Nothing is on the pan/),
    });
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
    expect(move(grown, { action: 'grow', sample: { quantity: 30, netWeight: 75 } })).toMatchObject({
      ok: false,
      reason: expect.stringMatching(/No pieces were added/),
    });
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

  it('moves a count to another scale once the sample is weighed, keeping the sample: tare there, then count', () => {
    expect(canMoveScale(tared())).toBe(false);
    expect(moveScale(tared(), 9)).toEqual({ ok: false, reason: expect.stringMatching(/sample first/) });
    const moved = moveScale(sampled(), 9);
    if (!moved.ok) throw new Error(moved.reason);
    expect(moved.work).toMatchObject({ step: 'tare', scaleId: 3, bulkScaleId: 9, sample: { quantity: 10, netWeight: 25 }, tare: null });
    expect(moveScale(moved.work, 9).ok).toBe(false);
    const counting = go(moved.work, { action: 'tare', stableGross: 410, containerId: null });
    expect(counting).toMatchObject({ step: 'count', tare: 410, sample: { quantity: 10 } });
    // The capture names both scales: the sample's and the bulk's.
    // Two scales weigh independently: the server counts the bulk with the sample taken as apart.
    expect(buildCaptureBody(counting, 660)).toMatchObject({
      scaleId: 3,
      bulkScaleId: 9,
      tare: 410,
      gross: 660,
      sample: { quantity: 10, netWeight: 25 },
      sampleOnPan: false,
    });
    // Moving back to the sample's own scale is no longer a two-scale count.
    const back = moveScale(counting, 3);
    expect(back.ok && back.work.bulkScaleId).toBe(null);
  });

  it('moves a bin count too: the new scale zeroes empty and the bin is counted on it', () => {
    const binSampled = go(fresh('bin'), { action: 'tare', stableGross: 0, containerId: null }, { action: 'sample', quantity: 20, stableGross: 10 });
    const moved = moveScale(binSampled, 9);
    if (!moved.ok) throw new Error(moved.reason);
    expect(go(moved.work, { action: 'tare', stableGross: 0.4, containerId: null })).toMatchObject({ step: 'count', panZero: 0.4, tare: 0.4, bulkScaleId: 9 });
  });

  it('keeps a stopped count’s sample for the part’s next count, which then counts only what goes on the pan', () => {
    const kept = keepSample(sampled(), new Date('2026-12-03T10:00:00Z'));
    expect(kept).toEqual({ partId: 7, scaleId: 3, sample: { quantity: 10, netWeight: 25 }, keptAt: '2026-12-03T10:00:00.000Z' });
    expect(keepSample(tared(), new Date())).toBeNull();
    expect(parseKeptSample(JSON.stringify(kept))).toEqual(kept);
    expect(parseKeptSample('{"partId":7}')).toBeNull();
    expect(canUseKept(fresh(), kept)).toBe(true);
    expect(canUseKept(startWork({ ...part, partId: 8, purpose: 'part' }), kept)).toBe(false);
    expect(canUseKept(tared(), kept)).toBe(false);
    const started = takeKept(fresh(), kept, 3);
    if (!started.ok) throw new Error(started.reason);
    const counting = go(started.work, { action: 'tare', stableGross: 150, containerId: null });
    expect(counting).toMatchObject({ step: 'count', sampleApart: true, bulkScaleId: null });
    // The kept pieces are off the pan: the server counts the net alone.
    expect(buildCaptureBody(counting, 400)).toMatchObject({ sampleOnPan: false, sample: { quantity: 10, netWeight: 25 }, tare: 150 });
    // Kept on scale 3, counted on scale 9: a two-scale count.
    const elsewhere = takeKept(fresh(), kept, 9);
    expect(elsewhere.ok && elsewhere.work).toMatchObject({ scaleId: 3, bulkScaleId: 9 });
    expect(takeKept(fresh(), null, 3).ok).toBe(false);
  });

  it('resumes work saved before counts could move scales or keep samples', () => {
    const { bulkScaleId: _b, sampleApart: _s, ...older } = sampled();
    expect(parseSavedWork(JSON.stringify(older))).toMatchObject({ step: 'grow', bulkScaleId: null, sampleApart: false });
  });
});
