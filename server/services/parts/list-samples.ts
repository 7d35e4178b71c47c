import 'server-only';
import { Part, PieceWeightSample } from '@/models';
import { getDb } from '../../db';
import { notFound } from '../../errors';
import type { SampleDto } from '@/lib/contracts/parts';
import { toSampleDto } from './part-dto';

export async function listSamples({ partId, limit = 100 }: { partId: number; limit?: number }): Promise<SampleDto[]> {
  getDb();
  if (!(await Part.count({ where: { id: partId } }))) throw notFound('Part');
  const rows = await PieceWeightSample.findAll({ where: { partId }, order: [['id', 'DESC']], limit });
  return rows.map(toSampleDto);
}
