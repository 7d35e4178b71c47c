import 'server-only';
import { Bin } from '@/models';
import { isDue } from '@/lib/variance';
import { getDb } from '../../db';
import type { BinDto } from '@/lib/contracts/bins';
import { toBinDto } from './bin-dto';

// The cycle-count plan: bins never counted, then the longest overdue, by their ABC class interval.
export async function binsDue({ now = new Date() }: { now?: Date } = {}): Promise<BinDto[]> {
  getDb();
  const bins = await Bin.findAll({
    include: [{ association: 'part' }],
    order: [
      ['lastCountedAt', 'ASC'],
      ['code', 'ASC'],
    ],
    limit: 5000,
  });
  return bins.filter((b) => isDue(b.lastCountedAt, b.abcClass, now)).map(toBinDto);
}
