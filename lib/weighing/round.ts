/** Rounding helpers shared by the counting outputs and the simulated scale. */

/** Decimal places needed to write a step such as 0.01 or 0.005 exactly. */
export function countDecimals(step: number): number {
  if (!Number.isFinite(step)) return 0;
  for (let places = 0; places <= 12; places += 1) {
    const scaled = step * 10 ** places;
    if (Math.abs(scaled - Math.round(scaled)) < 1e-9 * Math.max(1, scaled)) return places;
  }
  return 12;
}

/** Round to a whole number of steps (a scale division), without binary noise like 0.30000000000000004. */
export function roundToStep(value: number, step: number): number {
  const steps = Math.round(value / step);
  return Number((steps * step).toFixed(countDecimals(step)));
}

export function roundDecimals(value: number, places: number): number {
  const factor = 10 ** places;
  return Math.round(value * factor) / factor;
}

/**
 * Round up to `places` decimals. Uncertainties are rounded up, not to nearest,
 * so a reported U is never smaller than the computed one (GUM 7.2.6 allows this; from memory).
 */
export function roundUpDecimals(value: number, places: number): number {
  const factor = 10 ** places;
  // The small allowance keeps 0.3 from becoming 0.31 through 0.3 * 100 = 30.000000000000004.
  return Math.ceil(value * factor - 1e-9) / factor;
}

export function roundSignificant(value: number, digits: number): number {
  if (value === 0 || !Number.isFinite(value)) return value;
  return Number(value.toPrecision(digits));
}

/** Round down to `places` decimals: a probability reported never above the computed one. */
export function roundDownDecimals(value: number, places: number): number {
  const factor = 10 ** places;
  return Math.floor(value * factor + 1e-9) / factor;
}
