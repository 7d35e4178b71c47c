import 'server-only';
import { createHash } from 'node:crypto';
import { Op, UniqueConstraintError, type Transaction } from 'sequelize';
import { RequestKey } from '@/models';
import { getDb } from '../../db';
import { AppError } from '../../errors';

export interface OncePerKey {
  /** The Idempotency-Key header, if the caller sent one; without it every request creates. */
  key: string | undefined;
  userId: number;
  /** What kind of record: keys are per person and per scope. */
  scope: string;
  /** The request's input: the same key with other input is refused, not replayed. */
  input: unknown;
}

const fingerprintOf = (input: unknown) => createHash('sha256').update(JSON.stringify(input)).digest('hex');

async function replay(opts: OncePerKey, key: string): Promise<number | null> {
  const earlier = await RequestKey.findOne({ where: { userId: opts.userId, scope: opts.scope, idemKey: key } });
  if (!earlier) return null;
  if (earlier.fingerprint !== fingerprintOf(opts.input)) {
    throw new AppError('conflict', 'This Idempotency-Key was already used for a different request; send a new key for a new record');
  }
  return earlier.recordId;
}

/**
 * Runs a create once per Idempotency-Key: the key is written in the create's own transaction, so a
 * second request with it (sent again, or at the same moment) gets the first one's record id instead of
 * making another. `create` does its work in the transaction given and returns the new record's id.
 */
export async function oncePerKey(opts: OncePerKey, create: (transaction: Transaction) => Promise<number>): Promise<{ id: number; replayed: boolean }> {
  const db = getDb();
  const key = opts.key;
  if (!key) return { id: await db.transaction(create), replayed: false };
  const earlier = await replay(opts, key);
  if (earlier !== null) return { id: earlier, replayed: true };
  try {
    const id = await db.transaction(async (transaction) => {
      // Taken first: a twin request waits here on the unique index until this one commits or rolls back.
      const row = await RequestKey.create(
        { userId: opts.userId, scope: opts.scope, idemKey: key, fingerprint: fingerprintOf(opts.input), recordId: 0 },
        { transaction },
      );
      const made = await create(transaction);
      await row.update({ recordId: made }, { transaction });
      return made;
    });
    return { id, replayed: false };
  } catch (err) {
    if (!(err instanceof UniqueConstraintError)) throw err;
    const winner = await replay(opts, key);
    if (winner === null) throw err;
    return { id: winner, replayed: true };
  }
}

/** A key is kept a week: long past any retry of the request that sent it. */
export async function pruneRequestKeys(now = new Date()): Promise<number> {
  getDb();
  return RequestKey.destroy({ where: { createdAt: { [Op.lt]: new Date(now.getTime() - 7 * 86_400_000) } } });
}
