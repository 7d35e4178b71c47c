import 'server-only';
import type { z } from 'zod';
import type { bomCsvRowSchema, BomImportRow } from '@/lib/contracts/kits';

export interface BomGroup {
  kitCode: string;
  revision: string;
  rows: BomImportRow[];
  lines: Array<{ row: BomImportRow; data: z.infer<typeof bomCsvRowSchema> }>;
}

interface GroupContext {
  partIds: Map<string, number>;
  existing: { description: string; ordersReleased: boolean } | null;
}

const MAX_COMPONENTS = 500;

// The rules that look across the rows of one kit revision; messages land on the row they concern.
export function checkBomGroup(group: BomGroup, { partIds, existing }: GroupContext): void {
  const note = (row: BomImportRow, column: string, message: string) => {
    row.errors[column] ??= message;
  };
  if (existing) for (const row of group.rows) row.action = 'replace';
  if (existing?.ordersReleased) {
    for (const row of group.rows) note(row, 'kit_code', `orders were released from revision ${group.revision}; import it as a new revision`);
  }
  if (group.rows.length > MAX_COMPONENTS) note(group.rows[0], 'kit_code', `at most ${MAX_COMPONENTS} parts per kit`);
  const described = group.lines.filter((l) => l.data.description);
  const first = described[0];
  for (const l of described) if (l.data.description !== first.data.description) note(l.row, 'description', `differs from line ${first.row.line}`);
  if (!existing && !first && group.rows[0]) note(group.rows[0], 'description', 'a new kit needs a description on one of its lines');
  const seen = new Map<string, number>();
  for (const { row, data } of group.lines) {
    if (!partIds.has(data.part_number)) note(row, 'part_number', 'no such part');
    const earlier = seen.get(data.part_number);
    if (earlier !== undefined) note(row, 'part_number', `already on line ${earlier} of this kit`);
    else seen.set(data.part_number, row.line);
  }
}
