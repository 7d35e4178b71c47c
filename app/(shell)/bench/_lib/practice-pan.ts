/**
 * The simulator's pan as a replayable list of actions. The simulator draws piece weights from
 * its own seeded stream, so replaying the same actions on a fresh scale with the same seed puts
 * the very same pieces back on the pan after a reload.
 */
import { SimulatedScale } from '@/lib/scale/simulator';

export type PanAction =
  { kind: 'add'; n: number } | { kind: 'remove'; n: number } | { kind: 'container'; weight: number } | { kind: 'container-off' } | { kind: 'clear' };

export interface PracticePan {
  seed: number;
  /** Mean piece weight of the practice part, grams. */
  pieceWeight: number;
  spread: number;
  actions: PanAction[];
}

/** Used when a part has no learned APW yet: a small steel screw, about 2.5 g (our demo value). */
export const DEMO_PIECE_WEIGHT_G = 2.5;

export function applyPanAction(scale: SimulatedScale, action: PanAction): void {
  if (action.kind === 'add') scale.addPieces(action.n);
  else if (action.kind === 'remove') scale.removePieces(action.n);
  else if (action.kind === 'container') scale.placeContainer(action.weight);
  else if (action.kind === 'container-off') scale.removeContainer();
  else scale.clearPan();
}

export interface SimulatedScaleProfile {
  capacity: number;
  division: number;
  repeatability: number;
  settleMs: number;
  driftPerMinute: number;
  rateHz: number;
}

/** A simulated scale with the pan as it was: the actions replayed, the indication settled. */
export function buildSimulatedScale(profile: SimulatedScaleProfile, pan: PracticePan): SimulatedScale {
  const scale = new SimulatedScale({ ...profile, seed: pan.seed, part: { meanWeight: pan.pieceWeight, spread: pan.spread } });
  for (const action of pan.actions) applyPanAction(scale, action);
  scale.advance(10 * profile.settleMs);
  return scale;
}

export function piecesOnPan(pan: PracticePan): number {
  let n = 0;
  for (const a of pan.actions) {
    if (a.kind === 'add') n += a.n;
    else if (a.kind === 'remove') n = Math.max(0, n - a.n);
    else if (a.kind === 'clear') n = 0;
  }
  return n;
}

export function containerOnPan(pan: PracticePan): number | null {
  let weight: number | null = null;
  for (const a of pan.actions) {
    if (a.kind === 'container') weight = a.weight;
    else if (a.kind === 'container-off' || a.kind === 'clear') weight = null;
  }
  return weight;
}
