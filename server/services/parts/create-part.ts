import 'server-only';
import { Part } from '@/models';
import { getDb } from '../../db';
import type { CreatePartInput, PartDto } from '@/lib/contracts/parts';
import { toPartDto } from './part-dto';

export async function createPart({ input }: { input: CreatePartInput }): Promise<PartDto> {
  getDb();
  const part = await Part.create({ ...input, apwG: null, apwSampleSize: null, pieceSpread: null, photoFile: null });
  return toPartDto(part);
}
