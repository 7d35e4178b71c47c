/**
 * A bare load-cell front end: raw converter counts → grams (docs/counting-model.md, "Stability and raw load-cell input").
 * weight = (raw − zero) / slope, zero = mean of empty-pan readings,
 * slope = (raw at a reference mass − zero) / that mass, in counts per gram.
 */

import type { Reading } from './reading';

export interface AdcCalibration {
  /** Raw counts with an empty pan. */
  zero: number;
  /** Counts per gram. */
  slope: number;
}

/** One converter step in volts: full scale / 2^bits (10 bits over 5 V ≈ 4.88 mV; common practice). */
export function adcStepVolts(fullScaleVolts: number, bits: number): number {
  return fullScaleVolts / 2 ** bits;
}

/**
 * A reversed-excitation pair: a = offset + s, b = offset − s, so (a − b)/2 = s.
 * The amplifier's offset and slow drift cancel.
 */
export function pairSignal(a: number, b: number): number {
  return (a - b) / 2;
}

/** Consecutive readings taken as (a, b) pairs; an odd last reading is left out. */
export function pairSignals(raw: readonly number[]): number[] {
  const out: number[] = [];
  for (let i = 0; i + 1 < raw.length; i += 2) out.push(pairSignal(raw[i], raw[i + 1]));
  return out;
}

export function meanOf(values: readonly number[]): number {
  if (values.length === 0) throw new RangeError('meanOf: no values');
  return values.reduce((sum, v) => sum + v, 0) / values.length;
}

/** Zero capture: the mean of many empty-pan readings. */
export function captureZero(emptyReadings: readonly number[]): number {
  return meanOf(emptyReadings);
}

/** Two-point span with a reference mass (grams). */
export function spanCalibration(zero: number, rawAtReference: number, referenceMass: number): AdcCalibration {
  const slope = (rawAtReference - zero) / referenceMass;
  if (!Number.isFinite(slope) || slope === 0) throw new RangeError('spanCalibration: reference gives no span');
  return { zero, slope };
}

export function rawToGrams(raw: number, calibration: AdcCalibration): number {
  return (raw - calibration.zero) / calibration.slope;
}

/**
 * Effective division in grams: one converter step over the slope, divided by √N when N
 * readings are averaged. Assumption: the noise before the converter is at least about one
 * step (it dithers the rounding) and independent between readings; without noise, averaging
 * gains nothing. A reversed pair is two readings, so pass averaged = 2 per pair.
 */
export function effectiveDivision(slope: number, averaged: number = 1, countsPerStep: number = 1): number {
  return countsPerStep / Math.abs(slope) / Math.sqrt(Math.max(1, averaged));
}

/** A raw sample as a Reading in grams, rounded to the given division when one is given. */
export function rawToReading(raw: number, calibration: AdcCalibration, t: number, division?: number): Reading {
  const grams = rawToGrams(raw, calibration);
  const gross = division ? Math.round(grams / division) * division : grams;
  return { t, gross, unit: 'g', raw };
}
