import 'server-only';
import { driverCause } from './db-error-cause';
import { AppError } from './errors';

const DEADLOCK = 1213;
const LOCK_WAIT_TIMEOUT = 1205;

function isRetryable(err: unknown): boolean {
  const errno = driverCause(err)?.errno;
  return errno === DEADLOCK || errno === LOCK_WAIT_TIMEOUT;
}

/** Waits before try `i` + 1: "full jitter" backoff, a random time up to a doubling cap (common practice). */
function backoffMs(i: number): number {
  return Math.round(Math.random() * Math.min(400, 25 * 2 ** i));
}

// InnoDB may pick a transaction as a deadlock victim and roll it back whole; running it again is
// the documented remedy (MariaDB KB, "Deadlocks"). The work must be a complete transaction. When every
// try loses, the caller hears 503 with Retry-After: nothing was written, and sending it again is safe.
export async function retryOnDeadlock<T>(work: () => Promise<T>, attempts = 6): Promise<T> {
  for (let i = 1; ; i++) {
    try {
      return await work();
    } catch (err) {
      if (!isRetryable(err)) throw err;
      if (i >= attempts) {
        throw new AppError('unavailable', 'Too many changes to the same stock at once; nothing was saved. Try again in a moment.', {
          headers: { 'Retry-After': '1' },
        });
      }
      await new Promise((r) => setTimeout(r, backoffMs(i)));
    }
  }
}
