import 'server-only';
import type { Scale } from '@/models';
import { intervalCount } from '@/lib/metrology/accuracy-class';
import type { ScaleConnection } from '@/lib/contracts/scale-connection';
import type { ScaleDto } from '@/lib/contracts/scales';

export function toScaleDto(s: Scale): ScaleDto {
  const e = Number(s.verificationIntervalG);
  const capacity = Number(s.capacityG);
  return {
    id: s.id,
    name: s.name,
    location: s.location,
    unit: 'g',
    capacity,
    minLoad: Number(s.minLoadG),
    division: Number(s.divisionG),
    verificationInterval: e,
    accuracyClass: s.accuracyClass,
    intervals: intervalCount(capacity, e),
    repeatability: s.repeatabilityG === null ? null : Number(s.repeatabilityG),
    connection: s.connection as ScaleConnection,
    status: s.status,
    statusReason: s.statusReason,
    calibrationDueAt: s.calibrationDueAt,
    version: s.version,
  };
}
