// The list routes are measured on tables of a busy year's size: each is filled to LIST_ROWS rows by copying
// one real row (made through the models or the API, so every column is valid) with its single-column unique
// keys numbered. MariaDB's sequence engine (seq_1_to_N) numbers the copies in one INSERT … SELECT per table.
import { QueryTypes, type Sequelize } from 'sequelize';

export const LIST_ROWS = 10_000;

const rowsOf = async (db: Sequelize, sql: string, replacements: unknown[] = []) =>
  db.query<Record<string, unknown>>(sql, { type: QueryTypes.SELECT, replacements });

/** Copies row `templateId` of `table` until the table holds `rows` rows; returns the first new id (or null). */
export async function fillByCopying(db: Sequelize, table: string, templateId: number, rows = LIST_ROWS): Promise<number | null> {
  const [{ n }] = await rowsOf(db, `SELECT COUNT(*) AS n FROM \`${table}\``);
  const missing = rows - Number(n);
  if (missing <= 0) return null;
  const columns = (
    await rowsOf(db, 'SELECT COLUMN_NAME AS c FROM information_schema.COLUMNS WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME = ? ORDER BY ORDINAL_POSITION', [
      table,
    ])
  )
    .map((r) => String(r.c))
    .filter((c) => c !== 'id');
  const unique = new Set(
    (
      await rowsOf(
        db,
        "SELECT INDEX_NAME AS i, MIN(COLUMN_NAME) AS c, COUNT(*) AS k FROM information_schema.STATISTICS WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME = ? AND NON_UNIQUE = 0 AND INDEX_NAME <> 'PRIMARY' GROUP BY INDEX_NAME",
        [table],
      )
    )
      .filter((r) => Number(r.k) === 1)
      .map((r) => String(r.c)),
  );
  const [{ top }] = await rowsOf(db, `SELECT COALESCE(MAX(id), 0) AS top FROM \`${table}\``);
  // 'L' and the copy's number: short enough for every unique column here (the shortest is 20 characters).
  const value = (c: string) => (unique.has(c) ? `CONCAT('L', s.seq)` : `t.\`${c}\``);
  await db.query(
    `INSERT INTO \`${table}\` (${columns.map((c) => `\`${c}\``).join(', ')}) SELECT ${columns.map(value).join(', ')} FROM \`${table}\` t JOIN seq_1_to_${missing} s WHERE t.id = ?`,
    { replacements: [templateId] },
  );
  return Number(top) + 1;
}

/** Gives every order from `firstOrderId` on the lines of order `templateId`. */
export async function copyOrderLines(db: Sequelize, templateId: number, firstOrderId: number): Promise<void> {
  const columns = (
    await rowsOf(
      db,
      "SELECT COLUMN_NAME AS c FROM information_schema.COLUMNS WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME = 'build_order_lines' ORDER BY ORDINAL_POSITION",
    )
  )
    .map((r) => String(r.c))
    .filter((c) => c !== 'id' && c !== 'order_id');
  await db.query(
    `INSERT INTO build_order_lines (order_id, ${columns.map((c) => `\`${c}\``).join(', ')}) SELECT o.id, ${columns.map((c) => `l.\`${c}\``).join(', ')} FROM build_orders o JOIN build_order_lines l ON l.order_id = ? WHERE o.id >= ?`,
    { replacements: [templateId, firstOrderId] },
  );
}
