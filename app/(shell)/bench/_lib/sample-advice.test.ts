import { describe, expect, it } from 'vitest';
import { planNextGrow } from './sample-advice';

const noise = { division: 0.1, repeatability: 0.05 };
const known = (pieceSpread: number) => ({ kind: 'known' as const, pieceSpread });

describe('sample advice', () => {
  it('plans a grow step that adds pieces for a heavy tight part and none for a part below the division', () => {
    expect(planNextGrow({ noise, sample: { quantity: 10, netWeight: 25 }, spread: known(0.01) }).maxAdd).toBeGreaterThan(10);
    expect(planNextGrow({ noise, sample: { quantity: 10, netWeight: 0.5 }, spread: known(0.01) }).tooLight).toBe(true);
  });
});
