// Puts the test MariaDB through what a shop's server room does to it: a crash (SIGKILL) and a
// restart, and row locks held from outside so a request can be caught halfway through its transaction.
import { execFile } from 'node:child_process';
import path from 'node:path';
import { promisify } from 'node:util';
import * as mariadb from 'mariadb';
import { expect } from 'vitest';

const root = path.resolve(__dirname, '../..');
const run = promisify(execFile);
const profile = 'test';

export async function crashDatabase(): Promise<void> {
  await run('bash', [path.join(root, 'scripts/db-ctl.sh'), profile, 'crash']);
}

export async function startDatabase(): Promise<void> {
  await run('bash', [path.join(root, 'scripts/db-ctl.sh'), profile, 'start']);
}

// An administrator's connection over the private socket: it may read information_schema.INNODB_TRX,
// which the application account may not.
export async function adminConnection(): Promise<mariadb.Connection> {
  const conn = await mariadb.createConnection({
    socketPath: path.join(root, `.data/${profile}/run/mariadb.sock`),
    user: 'root',
    database: process.env.DB_NAME,
  });
  // A crash closes it under us; that is expected here, not an unhandled error.
  conn.on('error', () => undefined);
  return conn;
}

// Opens a transaction that holds FOR UPDATE locks on the rows the statements select; anything that
// needs those rows waits inside its own transaction until release() or the connection dies.
export async function holdRowLocks(statements: { sql: string; values: unknown[] }[]): Promise<{ release: () => Promise<void> }> {
  const conn = await adminConnection();
  await conn.beginTransaction();
  for (const s of statements) await conn.query(`${s.sql} FOR UPDATE`, s.values);
  return {
    release: async () => {
      await conn.commit().catch(() => undefined);
      await conn.end().catch(() => conn.destroy());
    },
  };
}

// Waits until at least n transactions are queued on a lock (the requests under test are halfway in).
export async function waitForLockWaits(n: number, timeoutMs = 20_000): Promise<void> {
  const conn = await adminConnection();
  try {
    let open: { trx_state: string; trx_query: string | null }[] = [];
    for (const end = Date.now() + timeoutMs; Date.now() < end; await new Promise((r) => setTimeout(r, 100))) {
      open = await conn.query('SELECT trx_state, trx_query FROM information_schema.INNODB_TRX');
      if (open.filter((t) => t.trx_state === 'LOCK WAIT').length >= n) return;
    }
    throw new Error(`expected ${n} transactions waiting on a lock; open transactions: ${JSON.stringify(open)}`);
  } finally {
    await conn.end();
  }
}

// Waits until no transaction is open at all: an orphaned one has been rolled back by the server.
export async function waitForNoOpenTransactions(): Promise<void> {
  const conn = await adminConnection();
  try {
    await expect
      .poll(async () => Number((await conn.query('SELECT COUNT(*) AS n FROM information_schema.INNODB_TRX'))[0].n), { timeout: 30_000, interval: 100 })
      .toBe(0);
  } finally {
    await conn.end();
  }
}
