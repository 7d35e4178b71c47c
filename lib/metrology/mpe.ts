/**
 * Maximum permissible errors of non-automatic weighing instruments:
 * OIML R 76-1:2006, Table 6 (initial verification); in service the MPE is twice that (3.5.2).
 * Loads are expressed in verification scale intervals e.
 */
import type { AccuracyClass } from './accuracy-class';

export type VerificationStage = 'initial' | 'in_service';

// Upper band limits in e for ±0.5 e and ±1.0 e; above the second limit the MPE is ±1.5 e.
const BANDS: Readonly<Record<AccuracyClass, readonly [number, number]>> = {
  I: [50_000, 200_000],
  II: [5_000, 20_000],
  III: [500, 2_000],
  IIII: [50, 200],
};

/** MPE in units of e for a load of m e (band limits inclusive, as Table 6 reads "0 ≤ m ≤ 500"). */
export function mpeInE(cls: AccuracyClass, loadInE: number, stage: VerificationStage = 'initial'): number {
  const [first, second] = BANDS[cls];
  const m = Math.abs(loadInE);
  const initial = m <= first ? 0.5 : m <= second ? 1 : 1.5;
  return stage === 'in_service' ? 2 * initial : initial;
}

/** MPE in mass units for a load in the same units. */
export function mpeAt(cls: AccuracyClass, e: number, load: number, stage: VerificationStage = 'initial'): number {
  // Loads are rounded to a millionth of e so 500 e computed as 250/0.5 lands on its band.
  const loadInE = Math.round((load / e) * 1e6) / 1e6;
  return mpeInE(cls, loadInE, stage) * e;
}
