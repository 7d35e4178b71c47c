import 'server-only';
import { Op } from 'sequelize';
import { BuildOrder, Kit, Part } from '@/models';
import { getDb } from '../../db';
import { AppError } from '../../errors';
import type { ImportCsvInput, ImportResult } from '@/lib/contracts/imports';
import { BOM_CSV_COLUMNS, bomCsvRowSchema, type BomImportRow } from '@/lib/contracts/kits';
import { readCsvRecords } from '../imports/read-csv-records';
import { rowErrors } from '../imports/row-errors';
import { checkBomGroup, type BomGroup } from './check-bom-group';
import { writeComponents } from './write-components';

const IDENTITY = Object.fromEntries(BOM_CSV_COLUMNS.map((c) => [c, c]));

// One file may hold several kit revisions, one line per component. Every row is checked before
// anything is written; a commit creates or replaces all of the revisions in one transaction.
export async function importBoms({ input }: { input: ImportCsvInput }): Promise<ImportResult<BomImportRow>> {
  const db = getDb();
  const records = readCsvRecords(input.csv, ['kit_code', 'revision', 'part_number', 'quantity'], ['description', 'tolerance_below', 'tolerance_above']);
  const groups = new Map<string, BomGroup>();
  const rows = records.map(({ line, values }) => {
    const parsed = bomCsvRowSchema.safeParse({
      ...values,
      description: values.description ?? '',
      tolerance_below: values.tolerance_below ?? '',
      tolerance_above: values.tolerance_above ?? '',
    });
    const row: BomImportRow = {
      line,
      kitCode: (values.kit_code ?? '').toUpperCase(),
      revision: (values.revision ?? '').toUpperCase(),
      description: values.description ?? '',
      partNumber: (values.part_number ?? '').toUpperCase(),
      quantity: values.quantity ?? '',
      toleranceBelow: values.tolerance_below || '0',
      toleranceAbove: values.tolerance_above || '0',
      action: 'create',
      errors: parsed.success ? {} : rowErrors(parsed.error, IDENTITY),
    };
    const key = `${row.kitCode}\u0000${row.revision}`;
    const group = groups.get(key) ?? { kitCode: row.kitCode, revision: row.revision, rows: [], lines: [] };
    group.rows.push(row);
    if (parsed.success) group.lines.push({ row, data: parsed.data });
    groups.set(key, group);
    return row;
  });

  const parts = await Part.findAll({ where: { partNumber: { [Op.in]: [...new Set(rows.map((r) => r.partNumber))] } }, attributes: ['id', 'partNumber'] });
  const partIds = new Map(parts.map((p) => [p.partNumber, p.id]));
  const kits = await Kit.findAll({ where: { [Op.or]: [...groups.values()].map((g) => ({ code: g.kitCode, revision: g.revision })) } });
  const kitOf = (g: BomGroup) => kits.find((k) => k.code === g.kitCode && k.revision === g.revision);
  const usedKitIds = new Set(
    (await BuildOrder.findAll({ where: { kitId: { [Op.in]: kits.map((k) => k.id) }, status: { [Op.ne]: 'draft' } }, attributes: ['kitId'] })).map(
      (o) => o.kitId,
    ),
  );
  for (const group of groups.values()) {
    const kit = kitOf(group);
    checkBomGroup(group, { partIds, existing: kit ? { description: kit.description, ordersReleased: usedKitIds.has(kit.id) } : null });
  }

  const valid = rows.every((r) => !Object.keys(r.errors).length);
  if (!valid || !input.commit) return { rows, valid, committed: false };

  await db.transaction(async (transaction) => {
    for (const group of groups.values()) {
      const components = group.lines.map(({ data }) => ({
        partId: partIds.get(data.part_number)!,
        quantity: data.quantity,
        toleranceBelow: data.tolerance_below,
        toleranceAbove: data.tolerance_above,
      }));
      const description = group.lines.find((l) => l.data.description)?.data.description;
      const kit = await Kit.findOne({ where: { code: group.kitCode, revision: group.revision }, transaction, lock: transaction.LOCK.UPDATE });
      if (!kit) {
        const created = await Kit.create({ code: group.kitCode, revision: group.revision, description: description! }, { transaction });
        await writeComponents(created.id, components, transaction);
        continue;
      }
      // Checked again under the lock: an order may have been released since the preview.
      if (await BuildOrder.count({ where: { kitId: kit.id, status: { [Op.ne]: 'draft' } }, transaction })) {
        throw new AppError('rule_violated', `Orders were released from ${kit.code} revision ${kit.revision}; import it as a new revision instead`);
      }
      await writeComponents(kit.id, components, transaction);
      if (description) kit.description = description;
      kit.changed('updatedAt', true);
      await kit.save({ transaction });
    }
  });
  return { rows, valid, committed: true };
}
