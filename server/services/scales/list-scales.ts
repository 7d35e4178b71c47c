import 'server-only';
import { Scale } from '@/models';
import { getDb } from '../../db';
import { notFound } from '../../errors';
import type { ScaleDto } from '@/lib/contracts/scales';
import { toScaleDto } from './scale-dto';

export async function listScales(): Promise<ScaleDto[]> {
  getDb();
  return (await Scale.findAll({ order: [['name', 'ASC']] })).map(toScaleDto);
}

export async function getScale({ scaleId }: { scaleId: number }): Promise<ScaleDto> {
  getDb();
  const scale = await Scale.findByPk(scaleId);
  if (!scale) throw notFound('Scale');
  return toScaleDto(scale);
}
