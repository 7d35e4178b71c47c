// Throwaway databases beside the test database, for migration checks: created and granted to the
// application account by the administrator, dropped afterwards.
import { randomUUID } from 'node:crypto';
import type { Sequelize } from 'sequelize';
import { createSequelize } from '../../models/sequelize';
import { adminConnection } from './database-faults';

export async function createScratchDatabase(label: string): Promise<{ name: string; db: Sequelize; drop: () => Promise<void> }> {
  const name = `tf_${label}_${randomUUID().slice(0, 8)}`;
  const admin = await adminConnection();
  const user = process.env.DB_USER ?? 'tallyforge';
  try {
    await admin.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
    for (const host of ['localhost', '127.0.0.1']) await admin.query(`GRANT ALL PRIVILEGES ON \`${name}\`.* TO ?@?`, [user, host]);
  } finally {
    await admin.end();
  }
  const db = createSequelize({
    host: process.env.DB_HOST ?? '127.0.0.1',
    port: Number(process.env.DB_PORT ?? 3308),
    database: name,
    username: user,
    password: process.env.DB_PASSWORD ?? '',
    poolMax: 3,
  });
  return {
    name,
    db,
    drop: async () => {
      await db.close();
      const conn = await adminConnection();
      await conn.query(`DROP DATABASE IF EXISTS \`${name}\``);
      await conn.end();
    },
  };
}

export interface SchemaShape {
  columns: string[];
  indexes: string[];
}

// The parts of a schema that must agree between two databases: every column with its type,
// nullability and default, and every index with its columns and uniqueness.
export async function schemaShape(database: string): Promise<SchemaShape> {
  const conn = await adminConnection();
  try {
    const columns = await conn.query(
      `SELECT TABLE_NAME t, COLUMN_NAME c, COLUMN_TYPE ty, IS_NULLABLE n, COLUMN_DEFAULT d FROM information_schema.COLUMNS
       WHERE TABLE_SCHEMA = ? AND TABLE_NAME <> 'schema_migrations' ORDER BY TABLE_NAME, COLUMN_NAME`,
      [database],
    );
    const indexes = await conn.query(
      `SELECT TABLE_NAME t, INDEX_NAME i, NON_UNIQUE u, GROUP_CONCAT(COLUMN_NAME ORDER BY SEQ_IN_INDEX) cols FROM information_schema.STATISTICS
       WHERE TABLE_SCHEMA = ? AND TABLE_NAME <> 'schema_migrations' GROUP BY TABLE_NAME, INDEX_NAME, NON_UNIQUE ORDER BY TABLE_NAME, cols, INDEX_NAME`,
      [database],
    );
    return {
      columns: columns.map((r: Record<string, unknown>) => `${r.t}.${r.c} ${r.ty} ${r.n === 'YES' ? 'null' : 'not null'} default ${r.d ?? '-'}`),
      indexes: indexes.map((r: Record<string, unknown>) => `${r.t}(${r.cols})${Number(r.u) === 0 ? ' unique' : ''}`),
    };
  } finally {
    await conn.end();
  }
}
