import { describe, expect, it } from 'vitest';
import { SimulatedScale } from '../scale/simulator';
import { findMaxExactQuantity } from './exact-range';
import { acceptGrowStep, planGrowStep, type GrowState } from './grow-sample';
import { netWeightUncertainty } from './uncertainty';

const uW = netWeightUncertainty({ division: 0.01 }); // 0.0040825 g, rounding only

describe('planGrowStep', () => {
  // Hand-worked (COUNTING.md quadratic, on-pan shared zero per GUM 5.2.2): n = 10, W_s = 6 g,
  // c = 0.5 %, u(W) = 0.0040825 g → u_r² = 2.5e-6 + 4.63e-7; a = 1.1852e-5,
  // b = 4·(2.5e-5 + 4.63e-5/10) = 1.1852e-4, c0 = −0.24981 → M* = 140.27 (141.03 without the
  // shared zero); with half a piece of margin, M + 0.5 ≤ 140.27 → 139 pieces.
  it('allows as many added pieces as stay exact with the current APW, with half a piece of margin', () => {
    const plan = planGrowStep({ sampleQuantity: 10, sampleNet: 6, pieceSpread: 0.005, netWeightUncertainty: uW });
    expect(plan.maxAdd).toBe(139);
    expect(plan.maxTotal).toBe(149);
    expect(plan.tooLight).toBe(false);
  });

  it('plans a step whose count stays exact even if the pieces read half a piece heavy', () => {
    const state: GrowState = { sampleQuantity: 25, sampleNet: 15, pieceSpread: 0.02, netWeightUncertainty: uW };
    const plan = planGrowStep(state);
    const heavy = acceptGrowStep(state, (plan.maxTotal + 0.49) * 0.6, true);
    expect(heavy.accepted).toBe(true);
    expect(acceptGrowStep(state, (plan.maxTotal + 2) * 0.6, true).accepted).toBe(false);
  });

  it('allows fewer pieces per step when the spread is loose', () => {
    const tight = planGrowStep({ sampleQuantity: 10, sampleNet: 6, pieceSpread: 0.005, netWeightUncertainty: uW });
    const loose = planGrowStep({ sampleQuantity: 10, sampleNet: 6, pieceSpread: 0.05, netWeightUncertainty: uW });
    expect(loose.maxAdd).toBeLessThan(tight.maxAdd);
    expect(loose.maxAdd).toBeGreaterThan(0);
  });
});

describe('acceptGrowStep', () => {
  const state: GrowState = { sampleQuantity: 10, sampleNet: 6, pieceSpread: 0.005, netWeightUncertainty: uW };

  it('accepts an exact, stable step and takes its count as the new sample', () => {
    const step = acceptGrowStep(state, 60.12, true);
    expect(step).toEqual({ accepted: true, sampleQuantity: 100, sampleNet: 60.12, averagePieceWeight: expect.closeTo(0.6012, 12), added: 90 });
  });

  it('refuses a step while the reading is moving', () => {
    const step = acceptGrowStep(state, 60.12, false);
    expect(step.accepted).toBe(false);
    if (!step.accepted) expect(step.reason).toBe('unstable');
  });

  it('refuses a step that added more pieces than can be counted exactly', () => {
    const step = acceptGrowStep(state, 600, true);
    expect(step.accepted).toBe(false);
    if (!step.accepted) {
      expect(step.reason).toBe('not_exact');
      expect(step.expandedUncertainty).toBeGreaterThanOrEqual(0.5);
    }
  });

  it('refuses a step that added nothing', () => {
    const step = acceptGrowStep(state, 6.01, true);
    expect(step.accepted).toBe(false);
    if (!step.accepted) expect(step.reason).toBe('nothing_added');
  });

  // COUNTING.md: "with a tight piece spread a sample of 10 grows to hundreds in two or three steps".
  it('grows a 10-piece sample past 500 pieces in three exact steps on a simulated scale', () => {
    const scale = new SimulatedScale({ seed: 11, capacity: 6000, division: 0.01, part: { meanWeight: 0.6, spread: 0.005 } });
    const settle = (): number => {
      scale.advance(5000);
      return scale.readNow().gross;
    };
    const zero = settle();
    scale.addPieces(10);
    let grow: GrowState = { sampleQuantity: 10, sampleNet: settle() - zero, pieceSpread: 0.005, netWeightUncertainty: uW };
    for (let i = 0; i < 3; i += 1) {
      const plan = planGrowStep(grow);
      scale.addPieces(plan.maxAdd);
      const step = acceptGrowStep(grow, settle() - zero, true);
      expect(step.accepted).toBe(true);
      if (!step.accepted) return;
      expect(step.sampleQuantity).toBe(scale.pieceCount());
      grow = { ...grow, sampleQuantity: step.sampleQuantity, sampleNet: step.sampleNet };
    }
    expect(grow.sampleQuantity).toBeGreaterThan(500);
    const range = findMaxExactQuantity({
      averagePieceWeight: grow.sampleNet / grow.sampleQuantity, apwRelativeUncertainty: 0,
      pieceSpread: 0.005, netWeightUncertainty: uW, sampleQuantity: grow.sampleQuantity, sampleOnPan: true,
    });
    expect(range.maxQuantity).toBeGreaterThan(grow.sampleQuantity);
  });
});
