import 'server-only';
import { Op, QueryTypes, type Transaction } from 'sequelize';
import { SignInThrottle } from '@/models';
import { getDb } from '../../db';
import { AppError } from '../../errors';

// Sign-in limits (common practice values). Attempts are counted per address and per (account, address)
// pair before the password is checked, so concurrent tries cannot slip past a limit; past it, that pair
// or address is blocked. Across addresses an account is only slowed, never blocked, so wrong passwords
// sent from elsewhere cannot keep its owner out.
const THROTTLE = {
  windowMinutes: 15,
  blockMinutes: 15,
  pairLimit: 5,
  addressLimit: 20,
  /** Wrong passwords for one account, from any address, before each further try is slowed. */
  accountQuietLimit: 10,
  accountDelayStepMs: 1_000,
  accountDelayMaxMs: 8_000,
} as const;

export interface ThrottleKeys {
  address: string;
  pair: string;
  account: string;
}

export function throttleKeys(email: string, address: string): ThrottleKeys {
  const account = email.trim().toLowerCase();
  return { address: `address:${address}`, pair: `pair:${account}|${address}`, account: `account:${account}` };
}

// A window that has run out, with no block in force, starts again. MariaDB assigns left to right, so
// each later assignment sees the new values of the earlier ones; `expired` is read before any is made.
const EXPIRED = `(window_start < UTC_TIMESTAMP() - INTERVAL :window MINUTE AND (blocked_until IS NULL OR blocked_until <= UTC_TIMESTAMP()))`;

async function countTry(key: string, limit: number, transaction?: Transaction): Promise<void> {
  await getDb().query(
    `INSERT INTO sign_in_throttles (scope_key, failures, window_start, blocked_until) VALUES (:key, 1, UTC_TIMESTAMP(), NULL)
     ON DUPLICATE KEY UPDATE
       failures = IF(${EXPIRED}, 1, failures + 1),
       blocked_until = IF(${EXPIRED}, NULL,
         IF(failures > :limit AND (blocked_until IS NULL OR blocked_until <= UTC_TIMESTAMP()), UTC_TIMESTAMP() + INTERVAL :block MINUTE, blocked_until)),
       window_start = IF(${EXPIRED}, UTC_TIMESTAMP(), window_start)`,
    { replacements: { key, limit, window: THROTTLE.windowMinutes, block: THROTTLE.blockMinutes }, transaction },
  );
}

interface Row {
  failures: number;
  blockedSeconds: number | null;
  live: number;
}

async function readRow(key: string, transaction?: Transaction): Promise<Row | undefined> {
  const rows = await getDb().query<Row>(
    `SELECT failures,
            IF(blocked_until > UTC_TIMESTAMP(), TIMESTAMPDIFF(SECOND, UTC_TIMESTAMP(), blocked_until), NULL) AS blockedSeconds,
            NOT ${EXPIRED} AS live
       FROM sign_in_throttles WHERE scope_key = :key`,
    { replacements: { key, window: THROTTLE.windowMinutes }, type: QueryTypes.SELECT, transaction },
  );
  return rows[0];
}

function refuse(seconds: number): never {
  const wait = Math.max(1, Number(seconds));
  throw new AppError('rate_limited', `Too many sign-in attempts from here. Try again in ${Math.ceil(wait / 60)} minute(s).`, {
    headers: { 'Retry-After': String(wait) },
  });
}

/** How long a try at an account that wrong passwords from anywhere have been hitting waits first. */
function accountDelayMs(recentFailures: number): number {
  const over = recentFailures - THROTTLE.accountQuietLimit;
  return over <= 0 ? 0 : Math.min(THROTTLE.accountDelayMaxMs, over * THROTTLE.accountDelayStepMs);
}

/**
 * Counts this try against the address and the pair, refusing it (429) once either is past its limit.
 * Each key's count and check happen under its row lock, so N parallel tries let exactly the limit through.
 * Returns how long to wait before checking the password.
 */
export async function admitSignIn(keys: ThrottleKeys): Promise<number> {
  return getDb().transaction(async (transaction) => {
    for (const [key, limit] of [
      [keys.address, THROTTLE.addressLimit],
      [keys.pair, THROTTLE.pairLimit],
    ] as const) {
      await countTry(key, limit, transaction);
      const row = (await readRow(key, transaction))!;
      if (row.blockedSeconds !== null) refuse(row.blockedSeconds);
    }
    const account = await readRow(keys.account, transaction);
    return account && Number(account.live) ? accountDelayMs(Number(account.failures)) : 0;
  });
}

/** A wrong password: counted against the account across addresses (it slows, never blocks). */
export async function recordWrongPassword(keys: ThrottleKeys): Promise<void> {
  await getDb().query(
    `INSERT INTO sign_in_throttles (scope_key, failures, window_start, blocked_until) VALUES (:key, 1, UTC_TIMESTAMP(), NULL)
     ON DUPLICATE KEY UPDATE failures = IF(${EXPIRED}, 1, failures + 1), window_start = IF(${EXPIRED}, UTC_TIMESTAMP(), window_start)`,
    { replacements: { key: keys.account, window: THROTTLE.windowMinutes } },
  );
}

/** A right password: the pair and account start clean, and the try is not held against the address. */
export async function recordSignedIn(keys: ThrottleKeys): Promise<void> {
  const db = getDb();
  await db.query('DELETE FROM sign_in_throttles WHERE scope_key IN (:keys)', { replacements: { keys: [keys.pair, keys.account] } });
  await db.query('UPDATE sign_in_throttles SET failures = GREATEST(failures - 1, 0) WHERE scope_key = :key', {
    replacements: { key: keys.address },
  });
}

/** Rows whose window and block ran out a day ago say nothing any more. */
export async function pruneSignInThrottles(now = new Date()): Promise<number> {
  getDb();
  const dayAgo = new Date(now.getTime() - 86_400_000);
  return SignInThrottle.destroy({ where: { windowStart: { [Op.lt]: dayAgo }, [Op.or]: [{ blockedUntil: null }, { blockedUntil: { [Op.lt]: now } }] } });
}
