/**
 * Judges a scale test against OIML R 76-1:2006: weighing test points (error within MPE, Table 6),
 * repeatability (range of results within the absolute MPE for that load, 3.6.1) and
 * eccentricity (each off-centre result within the MPE for that load, 3.6.2). Masses in one unit.
 */
import { intervalCount, minimumCapacity, type AccuracyClass } from './accuracy-class';
import { mpeAt, type VerificationStage } from './mpe';

export interface CalibrationTest {
  accuracyClass: AccuracyClass;
  verificationInterval: number;
  capacity: number;
  stage: VerificationStage;
  points: ReadonlyArray<{ load: number; indication: number }>;
  repeatability?: { load: number; indications: readonly number[] } | null;
  eccentricity?: { load: number; indications: readonly number[] } | null;
}

export interface CalibrationVerdict {
  points: Array<{ load: number; indication: number; error: number; mpe: number; pass: boolean }>;
  repeatability: { range: number; mpe: number; pass: boolean } | null;
  eccentricity: { maxError: number; mpe: number; pass: boolean } | null;
  minimumCapacity: number;
  intervals: number;
  pass: boolean;
}

// Errors are rounded to a millionth of e so a reading exactly at the MPE passes.
const tidy = (x: number, e: number): number => (Math.round((x / e) * 1e6) / 1e6) * e;

export function evaluateCalibration(test: CalibrationTest): CalibrationVerdict {
  const e = test.verificationInterval;
  const mpe = (load: number) => mpeAt(test.accuracyClass, e, load, test.stage);
  const points = test.points.map(({ load, indication }) => {
    const error = tidy(indication - load, e);
    return { load, indication, error, mpe: mpe(load), pass: Math.abs(error) <= mpe(load) };
  });
  const rep = test.repeatability;
  const repeatability =
    rep && rep.indications.length >= 2
      ? (() => {
          const range = tidy(Math.max(...rep.indications) - Math.min(...rep.indications), e);
          return { range, mpe: mpe(rep.load), pass: range <= mpe(rep.load) };
        })()
      : null;
  const ecc = test.eccentricity;
  const eccentricity =
    ecc && ecc.indications.length
      ? (() => {
          const maxError = tidy(Math.max(...ecc.indications.map((i) => Math.abs(i - ecc.load))), e);
          return { maxError, mpe: mpe(ecc.load), pass: maxError <= mpe(ecc.load) };
        })()
      : null;
  const pass = points.every((p) => p.pass) && (repeatability?.pass ?? true) && (eccentricity?.pass ?? true);
  return { points, repeatability, eccentricity, minimumCapacity: minimumCapacity(test.accuracyClass, e), intervals: intervalCount(test.capacity, e), pass };
}

/** Default weighing-test loads: Min, 500 e, 2000 e and Max for class III, the band edges per class. */
export function defaultTestLoads(cls: AccuracyClass, e: number, capacity: number): number[] {
  const edges: Record<AccuracyClass, number[]> = { I: [50_000, 200_000], II: [5_000, 20_000], III: [500, 2_000], IIII: [50, 200] };
  const loads = [minimumCapacity(cls, e), ...edges[cls].map((m) => m * e), capacity];
  return [...new Set(loads.filter((l) => l <= capacity).map((l) => tidy(l, e)))].sort((a, b) => a - b);
}

/** Repeatability standard deviation s_r from repeated indications of one load (sample std dev). */
export function repeatabilityStdDev(indications: readonly number[]): number | null {
  if (indications.length < 2) return null;
  const mean = indications.reduce((a, b) => a + b, 0) / indications.length;
  return Math.sqrt(indications.reduce((a, x) => a + (x - mean) ** 2, 0) / (indications.length - 1));
}
