/**
 * How many decimals a weight is shown with: those of the scale division d, so the display neither
 * hides the scale's resolution nor invents digits below it. Divisions take the form 1, 2 or 5 × 10^k
 * (OIML R 76-1 3.4.2 and NIST Handbook 44 2.20 S.1.2; both clause numbers from memory).
 */
export function displayDecimals(division: number): number {
  if (!(division > 0) || !Number.isFinite(division)) throw new RangeError('displayDecimals: division must be a positive number');
  // Count decimals of d itself (0.005 → 3, 0.02 → 2, 0.5 → 1, 2 → 0), robust to float noise.
  for (let decimals = 0; decimals <= 9; decimals++) {
    const scaled = division * 10 ** decimals;
    if (Math.abs(scaled - Math.round(scaled)) < 1e-6 * Math.max(1, scaled)) return decimals;
  }
  return 9;
}

/** A weight rounded to the division's decimals, as text; never "−0.000" (a zero below zero is zero). */
export function formatWeight(value: number, division: number): string {
  const text = value.toFixed(displayDecimals(division));
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
}
