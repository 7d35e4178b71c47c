import { describe, expect, it } from 'vitest';
import { adviseScales, judgeScale, type AdvisedScale } from './scale-advice';

const fine: AdvisedScale = { id: 1, name: 'Bench 1 · fine', division: 0.001, repeatability: 0.0008, capacity: 620, minLoad: 0.2, locked: false };
const kitting: AdvisedScale = { id: 2, name: 'Bench 2 · kitting', division: 0.1, repeatability: 0.05, capacity: 6000, minLoad: 20, locked: false };
const learned = { kind: 'learned' as const, scatter: 0.01 ** 2, noise: 0, degreesOfFreedom: 99, observations: 100 };

describe('advice before the count', () => {
  it("never advises a sample under the scale's Min", () => {
    const v = judgeScale(kitting, { averagePieceWeight: 0.62, spread: learned }, null, true);
    expect(v.sample * 0.62).toBeGreaterThanOrEqual(20);
    expect(v).toMatchObject({ usable: true, problem: null, sample: 33 });
  });

  it('says a part lighter than the division cannot be counted, and which scale of the bench can', () => {
    const advice = adviseScales([kitting, fine], kitting.id, { averagePieceWeight: 0.048, spread: learned }, 40, true)!;
    expect(advice.here.problem).toMatch(/lighter than Bench 2 · kitting's division/);
    expect(advice.better?.scale.id).toBe(fine.id);
    expect(advice.better?.verdict).toMatchObject({ usable: true, targetExact: true });
  });

  // Weighed apart (a bin), every piece is uncertain: c²·N alone is 5 pieces² for 2 000 pieces at 5 %.
  it('says when a target cannot be exact on this scale, and offers nothing when no scale does better', () => {
    const loose = { kind: 'assumed' as const, pieceSpread: 0.05 };
    const advice = adviseScales([kitting], kitting.id, { averagePieceWeight: 2.5, spread: loose }, 2000, false)!;
    expect(advice.here).toMatchObject({ usable: true, targetExact: false, problem: expect.stringMatching(/cannot be counted exactly/) });
    expect(advice.better).toBeNull();
  });

  it('says when the target is over Max, and that a locked scale cannot be used', () => {
    expect(judgeScale(fine, { averagePieceWeight: 2.5, spread: learned }, 400, true).problem).toMatch(/over Bench 1 · fine's Max/);
    expect(judgeScale({ ...fine, locked: true }, { averagePieceWeight: 2.5, spread: learned }, 40, true)).toMatchObject({
      usable: false,
      problem: 'Bench 1 · fine is locked.',
    });
  });
});
