import 'server-only';
import { Part } from '@/models';
import { getDb } from '../../db';
import type { ExportPartsQuery } from '@/lib/contracts/parts';
import { toPartDto } from './part-dto';
import { partSearch } from './part-search';

const HEADER = ['part_number', 'description', 'counting_method', 'apw_g', 'apw_sample_size', 'piece_spread', 'spread_learned'];

// The same columns the import reads come first, so an exported file can be edited and imported back.
export async function exportPartsTable(query: ExportPartsQuery): Promise<{ header: readonly string[]; rows: unknown[][] }> {
  getDb();
  const parts = await Part.findAll({ where: partSearch(query.q), order: [[query.sort, query.dir.toUpperCase()]], limit: 50_000 });
  const rows = parts
    .map(toPartDto)
    .map((p) => [p.partNumber, p.description, p.countingMethod, p.averagePieceWeight, p.apwSampleSize, p.pieceSpread, p.spreadLearned ? 'yes' : 'no']);
  return { header: HEADER, rows };
}
