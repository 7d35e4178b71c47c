import { route } from '@/server/http/route';
import { runCalibrationReminders } from '@/server/jobs/calibration-reminders';

// Runs the reminder job now (it also runs hourly in every instance); safe to call any number of times.
export const POST = route({ access: 'calibration.manage' }, async () => runCalibrationReminders());
