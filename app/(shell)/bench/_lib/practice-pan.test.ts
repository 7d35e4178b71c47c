import { describe, expect, it } from 'vitest';
import { buildSimulatedScale, containerOnPan, piecesOnPan, type PracticePan } from './practice-pan';

const profile = { capacity: 6000, division: 0.1, repeatability: 0, settleMs: 200, driftPerMinute: 0, rateHz: 20 };

describe('practice pan', () => {
  it('puts the same pieces back on the pan when its actions are replayed', () => {
    const pan: PracticePan = {
      seed: 42,
      pieceWeight: 2.5,
      spread: 0.02,
      actions: [
        { kind: 'container', weight: 150 },
        { kind: 'add', n: 10 },
        { kind: 'add', n: 30 },
      ],
    };
    const first = buildSimulatedScale(profile, pan);
    const again = buildSimulatedScale(profile, pan);
    expect(again.trueLoad()).toBe(first.trueLoad());
    expect(first.readNow().gross).toBeCloseTo(first.trueLoad(), 0);
  });

  it('tracks what is on the pan', () => {
    const pan: PracticePan = {
      seed: 1,
      pieceWeight: 1,
      spread: 0,
      actions: [
        { kind: 'add', n: 5 },
        { kind: 'container', weight: 10 },
        { kind: 'remove', n: 2 },
      ],
    };
    expect(piecesOnPan(pan)).toBe(3);
    expect(containerOnPan(pan)).toBe(10);
    expect(piecesOnPan({ ...pan, actions: [...pan.actions, { kind: 'clear' }] })).toBe(0);
  });
});
