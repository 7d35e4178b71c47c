/**
 * How the rounding errors of two readings on one scale depend on each other
 * (docs/counting-model.md, "Quiet scales").
 *
 * A reading is the load rounded to the division d. With repeatability s_r well above d/2 the
 * rounding errors of different readings are independent and uniform (variance d²/12 each,
 * JCGM 100:2008 F.2.2.1). On a quiet scale they are not: two readings whose true loads differ by
 * Δ have rounding errors whose covariance, over an unknown zero position, is the autocorrelation
 * of the saw-tooth ε(x) = (d/π)·Σ (−1)^(k+1) sin(2πkx/d)/k:
 *
 *   ρ(Δ) = Σ_k a_k·cos(2πkΔ/d)·exp(−(β + γ)·k²),  a_k = d²/(2π²k²)
 *
 * with β = 4π²s_r²/d² (each reading's own noise blurs its phase) and γ = 2π²σ²/d² where σ is how
 * uncertain Δ itself is (the pieces' spread makes the true load unknown to within σ). At s_r = σ = 0
 * this is d²·(1/12 − f(1 − f)/2) for f = frac(Δ/d): +d²/12 at f = 0, −d²/24 at f = 1/2.
 * Since Δ is unknown to better than σ, the count takes the worst phase: the largest ρ (f = 0) where
 * a positive covariance hurts and the most negative (f = 1/2) where a negative one does.
 */
import { indicationVariance } from './uncertainty';

export interface ReadingNoise {
  /** Division d. */
  division: number;
  /** Repeatability s_r (standard deviation of one reading); 0 when unknown. */
  repeatability: number;
}

function damping(noise: ReadingNoise, loadSpread: number): number {
  const d = noise.division;
  return (4 * Math.PI ** 2 * noise.repeatability ** 2 + 2 * Math.PI ** 2 * loadSpread ** 2) / (d * d);
}

const TERMS = 32;
/** Below this b (a blur of 0.1 division) the closed form is used: the series would need many terms. */
const SMALL_BLUR = 2 * Math.PI ** 2 * 0.01;

/**
 * The same sums for a small blur: ρ is the periodic parabola d²(1/12 − f(1 − f)/2) averaged over
 * f ± σ_f·Z with b = 2π²σ_f². Near f = 0 the parabola has its kink, E|σ_f·Z| = σ_f·√(2/π):
 * d²(1/12 − σ_f/√(2π) + σ_f²/2); at f = ½ it is smooth: −d²(1/24 − σ_f²/2). The next kink is
 * 5 σ_f away or more here, so wrapping adds nothing visible (both agree with the series at b = SMALL_BLUR).
 */
function nearlySharp(d: number, b: number, alternating: boolean): number {
  const s2 = b / (2 * Math.PI ** 2);
  if (alternating) return d * d * (1 / 24 - s2 / 2);
  return d * d * (1 / 12 - Math.sqrt(s2) / Math.sqrt(2 * Math.PI) + s2 / 2);
}

/**
 * Σ_k sign(k)·a_k·exp(−b·k²) over the first 32 terms, plus a bound on the rest, so the result is
 * never below the true sum (both feed the variance with a plus sign): the tail of the plain series
 * is at most exp(−b·33²)·Σ_{k>32} a_k < exp(−b·33²)·d²/(2π²·32); the alternating one is off by
 * less than its first omitted term.
 */
function series(d: number, b: number, alternating: boolean): number {
  if (b < SMALL_BLUR) return nearlySharp(d, b, alternating);
  // exp(−b·k²) by recurrence: exp(−b(k + 1)²) = exp(−b·k²)·exp(−b)^(2k + 1).
  const q = Math.exp(-b);
  const q2 = q * q;
  let step = q;
  let decay = 1;
  let sum = 0;
  for (let k = 1; k <= TERMS; k += 1) {
    decay *= step;
    step *= q2;
    if (decay < 1e-13) return sum;
    const term = (d * d * decay) / (2 * Math.PI ** 2 * k * k);
    sum += alternating && k % 2 === 0 ? -term : term;
  }
  const next = Math.exp(-b * (TERMS + 1) ** 2);
  const tail = alternating ? ((d * d) / (2 * Math.PI ** 2 * (TERMS + 1) ** 2)) * next : ((d * d) / (2 * Math.PI ** 2 * TERMS)) * next;
  return sum + tail;
}

/**
 * Largest covariance of two readings' rounding errors (loads a whole number of divisions apart),
 * given how uncertain their true difference is (loadSpread, same unit as d).
 */
export function largestRoundingCovariance(noise: ReadingNoise, loadSpread: number): number {
  return series(noise.division, damping(noise, loadSpread), false);
}

/**
 * The most negative covariance, as a positive number (loads half a division apart). The alternating
 * series is bounded by its first term, so this never exceeds d²/(2π²).
 */
export function mostNegativeRoundingCovariance(noise: ReadingNoise, loadSpread: number): number {
  return Math.max(0, series(noise.division, damping(noise, loadSpread), true));
}

/**
 * Upper bound on the variance of one net weight (load reading minus its zero reading):
 * 2(d²/12 + s_r²) for independent errors, plus 2·(most negative covariance); at s_r = 0 and a
 * load half a division from the grid, the net is d or 0 around its mean: variance d²/4.
 */
export function netVarianceBound(noise: ReadingNoise, loadSpread: number): number {
  return 2 * indicationVariance(noise) + 2 * mostNegativeRoundingCovariance(noise, loadSpread);
}
