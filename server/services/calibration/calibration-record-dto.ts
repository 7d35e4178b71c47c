import 'server-only';
import type { CalibrationRecord } from '@/models';
import type { CalibrationRecordDto } from '@/lib/contracts/calibration';

export function toCalibrationRecordDto(r: CalibrationRecord): CalibrationRecordDto {
  const verdict = r.verdict as { weightProblems?: string[] };
  return {
    id: r.id,
    scaleId: r.scaleId,
    stage: r.stage,
    performedAt: r.performedAt,
    performedBy: r.performedBy,
    verdict: r.verdict,
    weightsAdequate: r.weightsAdequate,
    weightProblems: verdict.weightProblems ?? [],
    pass: r.pass,
    nextDueAt: r.nextDueAt,
    notes: r.notes,
  };
}
