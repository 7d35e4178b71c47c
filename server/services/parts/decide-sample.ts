import 'server-only';
import { Part, PieceWeightSample } from '@/models';
import type { SessionUser } from '../../auth/session';
import { getDb } from '../../db';
import { AppError, notFound } from '../../errors';
import type { PartDto, SampleDecisionInput, SampleDto } from '@/lib/contracts/parts';
import { toPartDto, toSampleDto } from './part-dto';
import { relearnPart } from './relearn-part';

export interface DecideSampleOptions {
  partId: number;
  sampleId: number;
  input: SampleDecisionInput;
  by: SessionUser;
}

// A held sample is accepted (it then teaches the part like any other) or rejected (kept, teaching
// nothing). Only a held sample can be decided, once.
export async function decideSample({ partId, sampleId, input, by }: DecideSampleOptions): Promise<{ sample: SampleDto; part: PartDto }> {
  return getDb().transaction(async (transaction) => {
    const part = await Part.findByPk(partId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!part) throw notFound('Part');
    const sample = await PieceWeightSample.findOne({ where: { id: sampleId, partId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!sample) throw notFound('Sample');
    if (sample.status !== 'held') throw new AppError('conflict', `This sample was already ${sample.status}; only a held sample can be decided`);
    sample.status = input.decision === 'accept' ? 'accepted' : 'rejected';
    sample.decidedBy = by.id;
    sample.decidedAt = new Date();
    await sample.save({ transaction });
    if (sample.status === 'accepted') await relearnPart(part, transaction);
    return { sample: toSampleDto(sample), part: toPartDto(part) };
  });
}
