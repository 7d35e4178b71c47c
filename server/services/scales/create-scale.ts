import 'server-only';
import { Scale } from '@/models';
import { toGrams } from '@/lib/weighing/units';
import { getDb } from '../../db';
import type { CreateScaleInput, ScaleDto } from '@/lib/contracts/scales';
import { toScaleDto } from './scale-dto';
import { checkScaleMetrology } from './scale-metrology';

export async function createScale({ input }: { input: CreateScaleInput }): Promise<ScaleDto> {
  getDb();
  const g = (v: number) => toGrams(v, input.unit);
  const division = g(input.division);
  const verificationInterval = input.verificationInterval === undefined ? division : g(input.verificationInterval);
  const capacity = g(input.capacity);
  const { minLoad } = checkScaleMetrology({
    capacity,
    division,
    verificationInterval,
    accuracyClass: input.accuracyClass,
    minLoad: input.minLoad === undefined ? undefined : g(input.minLoad),
  });
  const scale = await Scale.create({
    name: input.name,
    location: input.location ?? null,
    capacityG: String(capacity),
    minLoadG: String(minLoad),
    divisionG: String(division),
    verificationIntervalG: String(verificationInterval),
    accuracyClass: input.accuracyClass,
    repeatabilityG: input.repeatability == null ? null : String(g(input.repeatability)),
    connection: input.connection,
    statusReason: null,
    calibrationDueAt: null,
  });
  return toScaleDto(scale);
}
