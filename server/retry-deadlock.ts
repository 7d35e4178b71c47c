import 'server-only';
import { driverCause } from './db-error-cause';

const DEADLOCK = 1213;
const LOCK_WAIT_TIMEOUT = 1205;

function isRetryable(err: unknown): boolean {
  const errno = driverCause(err)?.errno;
  return errno === DEADLOCK || errno === LOCK_WAIT_TIMEOUT;
}

// InnoDB may pick a transaction as a deadlock victim and roll it back whole; running it again is
// the documented remedy (MariaDB KB, "Deadlocks"). The work must be a complete transaction.
export async function retryOnDeadlock<T>(work: () => Promise<T>, attempts = 4): Promise<T> {
  for (let i = 1; ; i++) {
    try {
      return await work();
    } catch (err) {
      if (i >= attempts || !isRetryable(err)) throw err;
      await new Promise((r) => setTimeout(r, 20 * i + Math.random() * 30));
    }
  }
}
