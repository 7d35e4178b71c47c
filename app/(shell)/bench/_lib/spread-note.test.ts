import { describe, expect, it } from 'vitest';
import { describeSpread } from './spread-note';

const noise = { division: 0.001, repeatability: 0.0005 };

describe('describeSpread', () => {
  it('says how sure a learned spread is and what ten more single pieces would buy', () => {
    const note = describeSpread({
      belief: { kind: 'learned', scatter: 0.018 ** 2, noise: 1e-6, degreesOfFreedom: 4, observations: 5 },
      noise,
      averagePieceWeight: 0.6,
      sampleQuantity: 10,
      sampleOnPan: true,
    });
    expect(note.headline).toBe('Piece spread 1.8 % from 5 pieces');
    expect(note.more).toMatch(/^10 more pieces put on one at a time would let a sample of 10 count up to \d+ exactly, not (up to \d+|nothing)\.$/);
  });

  it('says an unlearned spread is assumed', () => {
    const note = describeSpread({ belief: { kind: 'assumed', pieceSpread: 0.05 }, noise, averagePieceWeight: 0.6, sampleQuantity: 10, sampleOnPan: true });
    expect(note.headline).toMatch(/not learned yet: 5\.0 % is assumed/);
  });

  it('offers nothing more when ten pieces would add less than a tenth to the reach', () => {
    const note = describeSpread({
      belief: { kind: 'learned', scatter: 0.01 ** 2, noise: 1e-8, degreesOfFreedom: 99, observations: 100 },
      noise: { division: 0.1, repeatability: 0.02 },
      averagePieceWeight: 2.5,
      sampleQuantity: 10,
      sampleOnPan: true,
    });
    expect(note.headline).toBe('Piece spread 1.0 % from 100 pieces');
    expect(note.more).toBeNull();
  });
});
