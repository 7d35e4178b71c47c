import 'server-only';
import { log } from '../log';
import { runCalibrationReminders } from './calibration-reminders';

const HOUR = 3_600_000;

// Runs scheduled work in each app instance; claimRun keeps several instances from repeating it.
export function startScheduler(): void {
  const tick = () => runCalibrationReminders().catch((err) => log.error({ err }, 'calibration reminders failed'));
  setTimeout(tick, 15_000).unref();
  setInterval(tick, HOUR).unref();
}
