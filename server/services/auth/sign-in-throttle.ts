import 'server-only';
import { QueryTypes } from 'sequelize';
import { getDb } from '../../db';
import { AppError } from '../../errors';

// Failed sign-ins allowed per rolling window before a key is blocked (common practice values).
export const THROTTLE = { windowMinutes: 15, blockMinutes: 15, accountLimit: 5, addressLimit: 20 } as const;

export interface ThrottleKey {
  key: string;
  limit: number;
}

export function throttleKeys(email: string, address: string): ThrottleKey[] {
  return [
    { key: `account:${email.toLowerCase()}`, limit: THROTTLE.accountLimit },
    { key: `address:${address}`, limit: THROTTLE.addressLimit },
  ];
}

export async function assertNotThrottled(keys: ThrottleKey[]): Promise<void> {
  const rows = await getDb().query<{ seconds: number }>(
    `SELECT TIMESTAMPDIFF(SECOND, UTC_TIMESTAMP(), blocked_until) AS seconds FROM sign_in_throttles
      WHERE scope_key IN (:keys) AND blocked_until > UTC_TIMESTAMP() ORDER BY blocked_until DESC LIMIT 1`,
    { replacements: { keys: keys.map((k) => k.key) }, type: QueryTypes.SELECT },
  );
  if (rows.length) {
    const seconds = Math.max(1, Number(rows[0].seconds));
    throw new AppError('rate_limited', `Too many failed sign-ins. Try again in ${Math.ceil(seconds / 60)} minute(s).`, {
      headers: { 'Retry-After': String(seconds) },
    });
  }
}

// One atomic upsert per key: the window restarts when it has run out, the block starts at the limit.
// MariaDB applies the assignments left to right, so blocked_until sees the new failure count.
export async function recordFailure(keys: ThrottleKey[]): Promise<void> {
  const db = getDb();
  for (const { key, limit } of keys) {
    await db.query(
      `INSERT INTO sign_in_throttles (scope_key, failures, window_start, blocked_until) VALUES (:key, 1, UTC_TIMESTAMP(), NULL)
       ON DUPLICATE KEY UPDATE
         failures = IF(window_start < UTC_TIMESTAMP() - INTERVAL :window MINUTE, 1, failures + 1),
         window_start = IF(window_start < UTC_TIMESTAMP() - INTERVAL :window MINUTE, UTC_TIMESTAMP(), window_start),
         blocked_until = IF(failures >= :limit, UTC_TIMESTAMP() + INTERVAL :block MINUTE, blocked_until)`,
      { replacements: { key, limit, window: THROTTLE.windowMinutes, block: THROTTLE.blockMinutes } },
    );
  }
}

export async function clearFailures(key: string): Promise<void> {
  await getDb().query('DELETE FROM sign_in_throttles WHERE scope_key = :key', { replacements: { key } });
}
