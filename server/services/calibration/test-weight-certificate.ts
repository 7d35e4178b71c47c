import 'server-only';
import { TestWeight } from '@/models';
import { getDb } from '../../db';
import { notFound } from '../../errors';
import type { TestWeightDto } from '../../schemas/calibration';
import { readUpload, storeUpload } from '../../uploads/store-upload';
import { toTestWeightDto } from './test-weights';

export async function saveCertificate({ testWeightId, file }: { testWeightId: number; file: unknown }): Promise<TestWeightDto> {
  getDb();
  const weight = await TestWeight.findByPk(testWeightId);
  if (!weight) throw notFound('Test weight');
  const { name } = await storeUpload(file, ['pdf'], 'certificate');
  weight.certificateFile = name;
  await weight.save();
  return toTestWeightDto(weight);
}

export async function readCertificate({ testWeightId }: { testWeightId: number }): Promise<{ bytes: Buffer; identifier: string }> {
  getDb();
  const weight = await TestWeight.findByPk(testWeightId);
  if (!weight?.certificateFile) throw notFound('Certificate');
  return { bytes: await readUpload(weight.certificateFile), identifier: weight.identifier };
}
