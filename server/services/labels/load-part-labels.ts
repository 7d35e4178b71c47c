import 'server-only';
import { Op } from 'sequelize';
import { Part } from '@/models';
import type { PartLabelData } from '@/labels/templates/part-label';
import { getDb } from '../../db';
import { inOrderOf } from './in-order-of';
import { partUrl } from './part-url';

export async function loadPartLabels({ ids }: { ids: number[] }): Promise<PartLabelData[]> {
  getDb();
  const parts = await Part.findAll({ where: { id: { [Op.in]: [...new Set(ids)] } } });
  return inOrderOf(ids, parts, 'part').map((part) => ({ partNumber: part.partNumber, description: part.description, partUrl: partUrl(part.id) }));
}
