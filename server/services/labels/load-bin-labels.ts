import 'server-only';
import { Op } from 'sequelize';
import { Bin, type Part } from '@/models';
import type { BinLabelData } from '@/labels/templates/bin-label';
import { getDb } from '../../db';
import { partUrl } from './part-url';
import { inOrderOf } from './in-order-of';

export async function loadBinLabels({ ids }: { ids: number[] }): Promise<BinLabelData[]> {
  getDb();
  const bins = (await Bin.findAll({ where: { id: { [Op.in]: [...new Set(ids)] } }, include: [{ association: 'part' }] })) as Array<Bin & { part: Part }>;
  return inOrderOf(ids, bins, 'bin').map((bin) => ({
    binCode: bin.code,
    partNumber: bin.part.partNumber,
    description: bin.part.description,
    partUrl: partUrl(bin.partId),
  }));
}
