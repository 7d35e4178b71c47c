import 'server-only';
import { TestWeight } from '@/models';
import { weightMpeMg, type WeightClass } from '@/lib/metrology/weight-classes';
import { siteDay } from '@/lib/time/site-clock';
import { toGrams } from '@/lib/weighing/units';
import { getDb } from '../../db';
import { AppError } from '../../errors';
import type { CreateTestWeightInput, TestWeightDto } from '@/lib/contracts/calibration';
import { siteTimeZone } from '../settings/get-settings';

// `today` is the site's day: a weight due today is still in date.
export function toTestWeightDto(w: TestWeight, today: string): TestWeightDto {
  const nominal = Number(w.nominalG);
  return {
    id: w.id,
    identifier: w.identifier,
    nominal,
    unit: 'g',
    weightClass: w.weightClass,
    mpeMg: weightMpeMg(nominal, w.weightClass as WeightClass),
    certificateNumber: w.certificateNumber,
    hasCertificate: Boolean(w.certificateFile),
    dueAt: w.dueAt,
    overdue: Boolean(w.dueAt && w.dueAt < today),
    active: w.active,
    version: w.version,
  };
}

export async function listTestWeights(): Promise<TestWeightDto[]> {
  getDb();
  const today = siteDay(await siteTimeZone());
  return (
    await TestWeight.findAll({
      order: [
        ['nominalG', 'ASC'],
        ['identifier', 'ASC'],
      ],
    })
  ).map((w) => toTestWeightDto(w, today));
}

// Only nominal values of the OIML R 111 1-2-5 series are accepted, so every weight has a class MPE.
export async function createTestWeight({ input }: { input: CreateTestWeightInput }): Promise<TestWeightDto> {
  getDb();
  const nominalG = toGrams(input.nominal, input.unit);
  if (weightMpeMg(nominalG, input.weightClass) === null) {
    throw new AppError('validation_failed', 'Some fields need attention', {
      fields: { nominal: 'Use a nominal value of the 1-2-5 series, 1 g to 50 kg (OIML R 111)' },
    });
  }
  const row = await TestWeight.create({
    identifier: input.identifier,
    nominalG: String(nominalG),
    weightClass: input.weightClass,
    certificateNumber: input.certificateNumber ?? null,
    certificateFile: null,
    dueAt: input.dueAt ?? null,
  });
  return toTestWeightDto(row, siteDay(await siteTimeZone()));
}
