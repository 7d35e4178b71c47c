import 'server-only';
import type { Part } from '@/models';
import type { SpreadBelief } from '@/lib/weighing';

// The part's learned spread as the counting core takes it. A part learned before degrees of freedom
// were kept has only ĉ and its observation count: it counts as ν = observations − 1, at least 1.
export function partSpreadBelief(part: Part): SpreadBelief | null {
  if (part.spreadDof != null && part.spreadScatter != null) {
    return {
      kind: 'learned',
      scatter: part.spreadScatter,
      noise: part.spreadNoise ?? 0,
      degreesOfFreedom: part.spreadDof,
      observations: part.spreadObservations,
    };
  }
  if (part.pieceSpread == null) return null;
  const c = Number(part.pieceSpread);
  return { kind: 'learned', scatter: c * c, noise: 0, degreesOfFreedom: Math.max(1, part.spreadObservations - 1), observations: part.spreadObservations };
}

// Stores a freshly learned belief with its point estimate for lists and labels.
export function storeSpreadBelief(part: Part, belief: SpreadBelief, estimate: number): void {
  if (belief.kind !== 'learned') return;
  part.pieceSpread = String(Math.min(0.99, estimate));
  part.spreadScatter = belief.scatter;
  part.spreadNoise = belief.noise;
  part.spreadDof = belief.degreesOfFreedom;
  part.spreadObservations = belief.observations;
}
