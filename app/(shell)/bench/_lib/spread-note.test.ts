import { describe, expect, it } from 'vitest';
import { describeSpread } from './spread-note';

const noise = { division: 0.001, repeatability: 0.0005 };

describe('describeSpread', () => {
  it('says how sure a learned spread is and what ten more single pieces would buy', () => {
    const note = describeSpread({ belief: { kind: 'learned', scatter: 0.018 ** 2, noise: 1e-6, degreesOfFreedom: 4, observations: 5 }, noise, averagePieceWeight: 0.6, sampleQuantity: 10, sampleOnPan: true });
    expect(note.headline).toBe('Piece spread 1.8 % from 5 pieces');
    expect(note.more).toMatch(/^10 more pieces put on one at a time would let a sample of 10 count up to \d+ exactly, not (up to \d+|nothing)\.$/);
  });

  it('says an unlearned spread is assumed', () => {
    const note = describeSpread({ belief: { kind: 'assumed', pieceSpread: 0.05 }, noise, averagePieceWeight: 0.6, sampleQuantity: 10, sampleOnPan: true });
    expect(note.headline).toMatch(/not learned yet: 5\.0 % is assumed/);
  });

  it('offers nothing more for a spread learned from many pieces already', () => {
    const note = describeSpread({ belief: { kind: 'learned', scatter: 0.002 ** 2, noise: 1e-8, degreesOfFreedom: 2000, observations: 2001 }, noise, averagePieceWeight: 0.6, sampleQuantity: 10, sampleOnPan: true });
    expect(note.more).toBeNull();
  });
});
