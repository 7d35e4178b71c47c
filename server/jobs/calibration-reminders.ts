import 'server-only';
import { Op } from 'sequelize';
import { Scale, User } from '@/models';
import { shiftDay, siteDay } from '@/lib/time/site-clock';
import { getDb } from '../db';
import { siteTimeZone } from '../services/settings/get-settings';
import { sendMail } from '../mail/send-mail';
import { claimRun } from './claim-run';

export const DUE_SOON_DAYS = 14;

export interface ReminderRun {
  dueSoon: number;
  overdue: number;
  mailsSent: number;
}

// Marks scales due soon, locks overdue ones, and tells quality once per scale and due date.
// A due date is a day at the site: a scale due today is locked only once the site's day is over.
export async function runCalibrationReminders(now = new Date()): Promise<ReminderRun> {
  getDb();
  const day = siteDay(await siteTimeZone(), now);
  const soon = shiftDay(day, DUE_SOON_DAYS);
  const scales = await Scale.findAll({ where: { calibrationDueAt: { [Op.ne]: null, [Op.lte]: soon } } });
  const quality = (await User.findAll({ where: { role: 'quality', active: true }, attributes: ['email'] })).map((u) => u.email);
  const run: ReminderRun = { dueSoon: 0, overdue: 0, mailsSent: 0 };
  for (const scale of scales) {
    const due = scale.calibrationDueAt!;
    const overdue = due < day;
    if (overdue) {
      run.overdue++;
      await Scale.update({ status: 'locked', statusReason: `Calibration overdue since ${due}` }, { where: { id: scale.id, status: { [Op.ne]: 'locked' } } });
    } else {
      run.dueSoon++;
      await Scale.update({ status: 'due' }, { where: { id: scale.id, status: 'in_service' } });
    }
    if (await claimRun('calibration-reminder', `${overdue ? 'overdue' : 'soon'}:${scale.id}:${due}`)) {
      const status = await sendMail({
        kind: 'calibration_reminder',
        to: quality,
        subject: overdue ? `Locked: ${scale.name} is past its calibration date` : `Calibration due: ${scale.name} by ${due}`,
        text: overdue
          ? `${scale.name} was due for calibration on ${due} and is now locked out. Record a passing test to put it back in service.`
          : `${scale.name} is due for calibration by ${due}. After that date it is locked out until a passing test is recorded.`,
      });
      if (status === 'sent') run.mailsSent++;
    }
  }
  return run;
}
