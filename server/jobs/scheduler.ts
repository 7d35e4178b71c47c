import 'server-only';
import { runCalibrationReminders } from './calibration-reminders';

const HOUR = 3_600_000;

// Runs scheduled work in each app instance; claimRun keeps several instances from repeating it.
export function startScheduler(): void {
  const tick = () => runCalibrationReminders().catch((err) => console.error('[jobs] calibration reminders failed', err));
  setTimeout(tick, 15_000).unref();
  setInterval(tick, HOUR).unref();
}
