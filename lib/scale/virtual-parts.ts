/** Virtual parts for the simulator: each piece's weight is drawn once, when it is made. */
import type { Random } from './prng';

export interface VirtualPart {
  /** Mean piece weight μ, grams. */
  meanWeight: number;
  /** Coefficient of variation c = σ/μ of single-piece weight. */
  spread: number;
}

export interface PartSupply {
  readonly part: VirtualPart;
  /** One new piece, normally distributed around μ with σ = c·μ. */
  draw(): number;
}

export function createPartSupply(part: VirtualPart, random: Random): PartSupply {
  // A piece never weighs nothing: clip the far left tail (irrelevant for c ≤ 0.2).
  const floor = part.meanWeight * 1e-3;
  return {
    part,
    draw: () => Math.max(floor, part.meanWeight * (1 + part.spread * random.normal())),
  };
}
