/** The standard normal distribution, as the counting judgement needs it. */

/**
 * erfc(x) with fractional error below 1.2e-7 everywhere (a Chebyshev fit, Press et al.,
 * Numerical Recipes, 2nd ed., §6.2, "erfcc"; from memory). Relative accuracy holds in the far
 * tail too, which the p-values of `not_whole_pieces` need.
 */
export function erfc(x: number): number {
  const z = Math.abs(x);
  const t = 1 / (1 + 0.5 * z);
  const poly =
    -z * z -
    1.26551223 +
    t *
      (1.00002368 +
        t * (0.37409196 + t * (0.09678418 + t * (-0.18628806 + t * (0.27886807 + t * (-1.13520398 + t * (1.48851587 + t * (-0.82215223 + t * 0.17087277))))))));
  const value = t * Math.exp(poly);
  return x >= 0 ? value : 2 - value;
}

/** P(|Z| > z) for a standard normal Z. */
export function twoSidedTail(z: number): number {
  return erfc(Math.abs(z) / Math.SQRT2);
}

/** The standard normal density. */
export function normalDensity(z: number): number {
  return Math.exp(-0.5 * z * z) / Math.sqrt(2 * Math.PI);
}
