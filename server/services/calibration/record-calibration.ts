import 'server-only';
import { CalibrationRecord, Scale } from '@/models';
import { evaluateCalibration, repeatabilityStdDev } from '@/lib/metrology/evaluate-calibration';
import { shiftDay, siteDay } from '@/lib/time/site-clock';
import { toGrams } from '@/lib/weighing/units';
import type { SessionUser } from '../../auth/session';
import { getDb } from '../../db';
import { notFound } from '../../errors';
import type { CalibrationRecordDto, RecordCalibrationInput } from '@/lib/contracts/calibration';
import { siteTimeZone } from '../settings/get-settings';
import { checkTestWeights } from './check-test-weights';
import { toCalibrationRecordDto } from './calibration-record-dto';

// Records a scale test and sets the scale's status from it in one transaction: a failing test locks
// the scale, a passing one (with adequate weights) puts it back in service with a new due date and
// the repeatability it showed (used as s_r when counting).
export async function recordCalibration({
  scaleId,
  input,
  by,
}: {
  scaleId: number;
  input: RecordCalibrationInput;
  by: SessionUser;
}): Promise<CalibrationRecordDto> {
  const db = getDb();
  const today = siteDay(await siteTimeZone());
  return db.transaction(async (transaction) => {
    const scale = await Scale.findByPk(scaleId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!scale) throw notFound('Scale');
    const g = (v: number) => toGrams(v, input.unit);
    const performedAt = input.performedAt ?? today;
    const test = {
      accuracyClass: scale.accuracyClass,
      verificationInterval: Number(scale.verificationIntervalG),
      capacity: Number(scale.capacityG),
      stage: input.stage,
      points: input.points.map((p) => ({ load: g(p.load), indication: g(p.indication) })),
      repeatability: input.repeatability ? { load: g(input.repeatability.load), indications: input.repeatability.indications.map(g) } : null,
      eccentricity: input.eccentricity ? { load: g(input.eccentricity.load), indications: input.eccentricity.indications.map(g) } : null,
    };
    const verdict = evaluateCalibration(test);
    const weights = await checkTestWeights(
      verdict.points.map((p, i) => ({ load: p.load, mpe: p.mpe, testWeightIds: input.points[i].testWeightIds })),
      performedAt,
      transaction,
    );
    const pass = verdict.pass && weights.adequate && input.zeroOk && input.tareOk;
    const nextDueAt = pass ? shiftDay(performedAt, input.intervalDays) : null;
    const record = await CalibrationRecord.create(
      {
        scaleId,
        stage: input.stage,
        performedAt,
        performedBy: by.id,
        test: { ...test, zeroOk: input.zeroOk, tareOk: input.tareOk },
        verdict: { ...verdict, weightProblems: weights.problems },
        testWeightIds: [...new Set(input.points.flatMap((p) => p.testWeightIds))],
        weightsAdequate: weights.adequate,
        pass,
        nextDueAt,
        notes: input.notes ?? null,
      },
      { transaction },
    );
    if (pass) {
      const sr = test.repeatability ? repeatabilityStdDev(test.repeatability.indications) : null;
      scale.set({ status: 'in_service', statusReason: null, calibrationDueAt: nextDueAt });
      if (sr !== null) scale.repeatabilityG = String(sr);
    } else {
      scale.set({ status: 'locked', statusReason: `Failed its test on ${performedAt}: ${failureSummary(verdict, weights.problems, input)}`.slice(0, 300) });
    }
    await scale.save({ transaction });
    return toCalibrationRecordDto(record);
  });
}

function failureSummary(v: ReturnType<typeof evaluateCalibration>, weightProblems: string[], input: RecordCalibrationInput): string {
  const parts: string[] = [];
  const failed = v.points.filter((p) => !p.pass);
  if (failed.length) parts.push(`error beyond MPE at ${failed.map((p) => `${p.load} g`).join(', ')}`);
  if (v.repeatability && !v.repeatability.pass) parts.push('repeatability');
  if (v.eccentricity && !v.eccentricity.pass) parts.push('eccentricity');
  if (!input.zeroOk) parts.push('zero');
  if (!input.tareOk) parts.push('tare');
  if (weightProblems.length) parts.push(`test weights: ${weightProblems.join('; ')}`);
  return parts.join('; ');
}
