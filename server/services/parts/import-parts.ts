import 'server-only';
import { Op } from 'sequelize';
import { Part } from '@/models';
import { getDb } from '../../db';
import type { ImportCsvInput, ImportResult } from '@/lib/contracts/imports';
import { createPartSchema, type PartImportRow } from '@/lib/contracts/parts';
import { readCsvRecords } from '../imports/read-csv-records';
import { rowErrors } from '../imports/row-errors';

const COLUMN_OF = { partNumber: 'part_number', description: 'description', countingMethod: 'counting_method' };

// Reads every row first; writes only when asked and only when every row is good, all in one transaction.
export async function importParts({ input }: { input: ImportCsvInput }): Promise<ImportResult<PartImportRow>> {
  const db = getDb();
  const records = readCsvRecords(input.csv, ['part_number', 'description'], ['counting_method']);
  const parsed = records.map(({ line, values }) => {
    const result = createPartSchema.safeParse({
      partNumber: values.part_number,
      description: values.description,
      countingMethod: values.counting_method?.toLowerCase() || undefined,
    });
    const row: PartImportRow = {
      line,
      partNumber: result.success ? result.data.partNumber : values.part_number.toUpperCase(),
      description: values.description,
      countingMethod: result.success ? result.data.countingMethod : values.counting_method || 'scale',
      action: 'create',
      errors: result.success ? {} : rowErrors(result.error, COLUMN_OF),
    };
    return { row, data: result.success ? result.data : null };
  });
  markRepeats(parsed.map((p) => p.row));
  const existing = await Part.findAll({ where: { partNumber: { [Op.in]: parsed.map((p) => p.row.partNumber) } }, attributes: ['partNumber'] });
  const known = new Set(existing.map((p) => p.partNumber));
  for (const { row } of parsed) if (known.has(row.partNumber)) row.action = 'update';
  const rows = parsed.map((p) => p.row);
  const valid = rows.every((r) => !Object.keys(r.errors).length);
  if (!valid || !input.commit) return { rows, valid, committed: false };

  await db.transaction(async (transaction) => {
    const locked = await Part.findAll({ where: { partNumber: { [Op.in]: rows.map((r) => r.partNumber) } }, transaction, lock: transaction.LOCK.UPDATE });
    const byNumber = new Map(locked.map((p) => [p.partNumber, p]));
    const creates = [];
    for (const { data } of parsed) {
      const part = byNumber.get(data!.partNumber);
      if (!part) {
        creates.push({ ...data!, apwG: null, apwSampleSize: null, pieceSpread: null, photoFile: null });
        continue;
      }
      part.description = data!.description;
      part.countingMethod = data!.countingMethod;
      await part.save({ transaction });
    }
    await Part.bulkCreate(creates, { transaction });
  });
  return { rows, valid, committed: true };
}

// A part number may appear once per file; later repeats are errors.
function markRepeats(rows: PartImportRow[]): void {
  const seen = new Map<string, number>();
  for (const row of rows) {
    const first = seen.get(row.partNumber);
    if (first !== undefined && !row.errors.part_number) row.errors.part_number = `repeats line ${first}`;
    else seen.set(row.partNumber, row.line);
  }
}
