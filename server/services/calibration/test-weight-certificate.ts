import 'server-only';
import { TestWeight } from '@/models';
import { siteDay } from '@/lib/time/site-clock';
import { getDb } from '../../db';
import { notFound } from '../../errors';
import type { TestWeightDto } from '@/lib/contracts/calibration';
import { readUpload, storeAttachedUpload } from '../../uploads/store-upload';
import { siteTimeZone } from '../settings/get-settings';
import { toTestWeightDto } from './test-weights';

// A superseded certificate's file is kept: it backs the calibrations recorded while it was current.
export async function saveCertificate({ testWeightId, file }: { testWeightId: number; file: unknown }): Promise<TestWeightDto> {
  getDb();
  const weight = await storeAttachedUpload(file, ['pdf'], 'certificate', async (name) => {
    const found = await TestWeight.findByPk(testWeightId);
    if (!found) throw notFound('Test weight');
    found.certificateFile = name;
    return found.save();
  });
  return toTestWeightDto(weight, siteDay(await siteTimeZone()));
}

export async function readCertificate({ testWeightId }: { testWeightId: number }): Promise<{ bytes: Buffer; identifier: string }> {
  getDb();
  const weight = await TestWeight.findByPk(testWeightId);
  if (!weight?.certificateFile) throw notFound('Certificate');
  return { bytes: await readUpload(weight.certificateFile), identifier: weight.identifier };
}
