import 'server-only';
import { log } from '../log';
import { pruneSignInThrottles } from '../services/auth/sign-in-throttle';
import { failInterruptedPrintJobs } from '../services/print-jobs/fail-interrupted-print-jobs';
import { pruneRequestKeys } from '../services/requests/once-per-key';
import { runCalibrationReminders } from './calibration-reminders';
import { pruneSessions } from './prune-sessions';

const MINUTE = 60_000;

function every(ms: number, name: string, work: () => Promise<unknown>): void {
  const tick = () => work().catch((err) => log.error({ err }, `${name} failed`));
  setTimeout(tick, 15_000).unref();
  setInterval(tick, ms).unref();
}

// Runs scheduled work in each app instance; claimRun keeps several instances from repeating a
// reminder, and the print-job sweep is one conditional UPDATE, safe to run anywhere at once.
export function startScheduler(): void {
  every(60 * MINUTE, 'calibration reminders', () => runCalibrationReminders());
  every(5 * MINUTE, 'interrupted print jobs', () => failInterruptedPrintJobs());
  every(60 * MINUTE, 'old sessions', () => pruneSessions());
  every(60 * MINUTE, 'old sign-in counts', () => pruneSignInThrottles());
  every(60 * MINUTE, 'old request keys', () => pruneRequestKeys());
}
