/** A load-cell front end's zero and slope, kept per workstation, and the raw → grams step. */
import { captureZero, effectiveDivision, pairSignals, spanCalibration, type AdcCalibration } from '@/lib/scale/raw-adc';

export interface AdcSetup {
  reversedExcitation: boolean;
  averaging: number;
}

/** Raw readings → signals: reversed pairs (a − b)/2 when the front end alternates excitation. */
export function signalsOf(raw: readonly number[], setup: AdcSetup): number[] {
  return setup.reversedExcitation ? pairSignals(raw) : [...raw];
}

export function zeroFrom(raw: readonly number[], setup: AdcSetup): number {
  return captureZero(signalsOf(raw, setup));
}

export function calibrate(zero: number, rawAtReference: readonly number[], referenceMass: number, setup: AdcSetup): AdcCalibration {
  return spanCalibration(zero, captureZero(signalsOf(rawAtReference, setup)), referenceMass);
}

/** Effective d in grams: a reversed pair averages two readings. */
export function effectiveDivisionOf(calibration: AdcCalibration, setup: AdcSetup): number {
  return effectiveDivision(calibration.slope, setup.averaging * (setup.reversedExcitation ? 2 : 1));
}

export function parseCalibration(text: string | null): AdcCalibration | null {
  try {
    const c = JSON.parse(text ?? 'null') as AdcCalibration | null;
    return c && Number.isFinite(c.zero) && Number.isFinite(c.slope) && c.slope !== 0 ? { zero: c.zero, slope: c.slope } : null;
  } catch {
    return null;
  }
}
