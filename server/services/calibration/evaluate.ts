import 'server-only';
import { evaluateCalibration, type CalibrationVerdict } from '@/lib/metrology/evaluate-calibration';
import { fromGrams, toGrams } from '@/lib/weighing/units';
import type { EvaluateCalibrationInput } from '@/lib/contracts/calibration';

// The pure verdict in the request's unit: converted to grams, judged, converted back.
export function evaluateInUnit(input: EvaluateCalibrationInput): CalibrationVerdict {
  const g = (v: number) => toGrams(v, input.unit);
  const back = (v: number) => Math.round(fromGrams(v, input.unit) * 1e9) / 1e9;
  const v = evaluateCalibration({
    accuracyClass: input.accuracyClass,
    verificationInterval: g(input.verificationInterval),
    capacity: g(input.capacity),
    stage: input.stage,
    points: input.points.map((p) => ({ load: g(p.load), indication: g(p.indication) })),
    repeatability: input.repeatability ? { load: g(input.repeatability.load), indications: input.repeatability.indications.map(g) } : null,
    eccentricity: input.eccentricity ? { load: g(input.eccentricity.load), indications: input.eccentricity.indications.map(g) } : null,
  });
  return {
    points: v.points.map((p) => ({ ...p, load: back(p.load), indication: back(p.indication), error: back(p.error), mpe: back(p.mpe) })),
    repeatability: v.repeatability && { ...v.repeatability, range: back(v.repeatability.range), mpe: back(v.repeatability.mpe) },
    eccentricity: v.eccentricity && { ...v.eccentricity, maxError: back(v.eccentricity.maxError), mpe: back(v.eccentricity.mpe) },
    minimumCapacity: back(v.minimumCapacity),
    intervals: v.intervals,
    pass: v.pass,
  };
}
