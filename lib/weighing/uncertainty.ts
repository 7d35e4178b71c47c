/**
 * Standard uncertainty of a net weight, JCGM 100:2008 (GUM).
 * Every weight here is in grams (or any one unit used consistently).
 */
export interface WeighingNoise {
  /** Scale division d used for counting. */
  division: number;
  /** Repeatability standard deviation s_r; 0 when unknown (rounding alone then). */
  repeatability?: number;
}

export interface CalibrationTerm {
  /** The net load W the term applies to. */
  load: number;
  /** Relative standard uncertainty of the scale's calibration at that load (e.g. MPE/√3 ÷ load). */
  relativeCalibration: number;
}

/** GUM F.2.2.1: a digital indication of resolution δx has u = δx/√12. */
export function resolutionUncertainty(division: number): number {
  return division / Math.sqrt(12);
}

/** GUM 4.3.7: a rectangular distribution of half-width a has u = a/√3 (e.g. an MPE). */
export function rectangularUncertainty(halfWidth: number): number {
  return halfWidth / Math.sqrt(3);
}

/** Variance of one indication: rounding plus repeatability, d²/12 + s_r². */
export function indicationVariance(noise: WeighingNoise): number {
  const sr = noise.repeatability ?? 0;
  return (noise.division * noise.division) / 12 + sr * sr;
}

/**
 * u(W)² = 2·(d²/12 + s_r²): a net weight is the difference of two indications
 * (gross and tare/zero). When sample and bulk are weighed on different scales,
 * add (u_rel·W)² because systematic errors no longer cancel in the ratio.
 */
export function netWeightUncertainty(noise: WeighingNoise, calibration?: CalibrationTerm): number {
  let variance = 2 * indicationVariance(noise);
  if (calibration) {
    const term = calibration.relativeCalibration * calibration.load;
    variance += term * term;
  }
  return Math.sqrt(variance);
}
