import { describe, expect, it } from 'vitest';
import { DEFAULT_SAMPLE_QUANTITY, planNextGrow, suggestSampleQuantity } from './sample-advice';

const noise = { division: 0.1, repeatability: 0.05 };
const assumed = { kind: 'assumed' as const, pieceSpread: 0.05 };
const known = (pieceSpread: number) => ({ kind: 'known' as const, pieceSpread });

describe('sample advice', () => {
  it('suggests 10 when nothing is known about the part', () => {
    expect(suggestSampleQuantity({ noise, averagePieceWeight: null, spread: assumed, targetQuantity: 200, sampleOnPan: true })).toBe(DEFAULT_SAMPLE_QUANTITY);
  });

  it('suggests a larger sample when a tight part and a target need one', () => {
    const n = suggestSampleQuantity({ noise, averagePieceWeight: 0.5, spread: known(0.005), targetQuantity: 100, sampleOnPan: true });
    expect(n).toBeGreaterThan(DEFAULT_SAMPLE_QUANTITY);
    expect(n).toBeLessThan(100);
  });

  it('plans a grow step that adds pieces for a heavy tight part and none for a part below the division', () => {
    expect(planNextGrow({ noise, sample: { quantity: 10, netWeight: 25 }, spread: known(0.01) }).maxAdd).toBeGreaterThan(10);
    expect(planNextGrow({ noise, sample: { quantity: 10, netWeight: 0.5 }, spread: known(0.01) }).tooLight).toBe(true);
  });
});
