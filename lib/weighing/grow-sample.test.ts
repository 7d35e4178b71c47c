import { describe, expect, it } from 'vitest';
import { SimulatedScale } from '../scale/simulator';
import { acceptGrowStep, planGrowStep, type GrowState } from './grow-sample';
import { exactReach } from './exact-reach';

const noise = { division: 0.01, repeatability: 0 };
const known = (pieceSpread: number) => ({ kind: 'known' as const, pieceSpread });

describe('planGrowStep', () => {
  // Hand-worked with docs/counting-model.md: n = 10, W_s = 6 g, c = 0.5 %, d = 0.01 g, s_r = 0. The
  // pieces blur the rounding phase (σ = APW·c·√n ≈ 0.95 d), so the dependent-rounding terms vanish and
  // u² = M·c² + M²·(c²/n + u(W)²/W_s²) + (u(W)²/APW²)(1 + M/n), u(W)² = d²/6 (GUM F.2.2.1):
  // 2.963e-6·M² + 2.963e-5·M + 4.63e-5 = u_plan² = 0.19631² → M = 109.1 → 109 pieces.
  it('allows as many added pieces as stay within exact reach', () => {
    const plan = planGrowStep({ sampleQuantity: 10, sampleNet: 6, spread: known(0.005), noise });
    expect(plan.maxAdd).toBe(109);
    expect(plan.maxTotal).toBe(119);
    expect(plan.tooLight).toBe(false);
  });

  it("never plans past the pan total the caller caps it at (a kit line's window)", () => {
    const plan = planGrowStep({ sampleQuantity: 10, sampleNet: 6, spread: known(0.005), noise }, 40);
    expect(plan).toEqual({ maxAdd: 30, maxTotal: 40, tooLight: false });
  });

  it('plans a step whose count is judged exact even when the pieces read a little heavy', () => {
    const state: GrowState = { sampleQuantity: 25, sampleNet: 15, spread: known(0.02), noise };
    const plan = planGrowStep(state);
    expect(acceptGrowStep(state, (plan.maxTotal + 0.25) * 0.6, true).accepted).toBe(true);
    expect(acceptGrowStep(state, (plan.maxTotal + 0.5) * 0.6, true).accepted).toBe(false);
  });

  it('allows fewer pieces per step when the spread is loose, and fewer still when it is learned from 5 pieces only', () => {
    const tight = planGrowStep({ sampleQuantity: 10, sampleNet: 6, spread: known(0.005), noise });
    const loose = planGrowStep({ sampleQuantity: 10, sampleNet: 6, spread: known(0.05), noise });
    const fromFive = planGrowStep({
      sampleQuantity: 10,
      sampleNet: 6,
      spread: { kind: 'learned', scatter: 0.005 ** 2, noise: 0, degreesOfFreedom: 4, observations: 5 },
      noise,
    });
    expect(loose.maxAdd).toBeLessThan(tight.maxAdd);
    expect(loose.maxAdd).toBeGreaterThan(0);
    expect(fromFive.maxAdd).toBeLessThan(tight.maxAdd);
  });

  it('says when not even one piece can be added exactly', () => {
    expect(planGrowStep({ sampleQuantity: 10, sampleNet: 0.15, spread: known(0.01), noise }).tooLight).toBe(true);
  });
});

describe('acceptGrowStep', () => {
  const state: GrowState = { sampleQuantity: 10, sampleNet: 6, spread: known(0.005), noise };

  it('accepts an exact, stable step and takes its count as the new sample', () => {
    const step = acceptGrowStep(state, 60.12, true);
    expect(step).toEqual({ accepted: true, sampleQuantity: 100, sampleNet: 60.12, averagePieceWeight: expect.closeTo(0.6012, 12), added: 90 });
  });

  it('refuses a step while the reading is moving', () => {
    const step = acceptGrowStep(state, 60.12, false);
    expect(step.accepted).toBe(false);
    if (!step.accepted) expect(step.reason).toBe('unstable');
  });

  it('refuses a step that added more pieces than can be counted exactly, with the ± range', () => {
    const step = acceptGrowStep(state, 600, true);
    expect(step.accepted).toBe(false);
    if (!step.accepted) {
      expect(step.reason).toBe('not_exact');
      expect(step.wholePieceRange).toBeGreaterThanOrEqual(1);
    }
  });

  it('refuses a step that added nothing', () => {
    const step = acceptGrowStep(state, 6.01, true);
    expect(step.accepted).toBe(false);
    if (!step.accepted) expect(step.reason).toBe('nothing_added');
  });

  it('grows a 10-piece sample past 500 pieces in three exact steps on a simulated scale', () => {
    const scale = new SimulatedScale({ seed: 11, capacity: 6000, division: 0.01, part: { meanWeight: 0.6, spread: 0.005 } });
    const settle = (): number => {
      scale.advance(5000);
      return scale.readNow().gross;
    };
    const zero = settle();
    scale.addPieces(10);
    let grow: GrowState = { sampleQuantity: 10, sampleNet: settle() - zero, spread: known(0.005), noise };
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
    const reach = exactReach(
      { sampleQuantity: grow.sampleQuantity, averagePieceWeight: grow.sampleNet / grow.sampleQuantity, sampleScale: noise, sampleOnPan: true },
      0.005 ** 2,
    );
    expect(reach.maxQuantity).toBeGreaterThan(grow.sampleQuantity);
  });
});
