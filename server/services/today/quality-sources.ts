import 'server-only';
import { Op } from 'sequelize';
import { Audit, Scale } from '@/models';
import { can } from '@/lib/roles';
import { shiftDay, siteDay } from '@/lib/time/site-clock';
import { DUE_SOON_DAYS } from '../../jobs/calibration-reminders';
import { siteTimeZone } from '../settings/get-settings';
import type { WaitingSource } from './waiting-item';

export const QUALITY_SOURCES: WaitingSource[] = [
  async ({ role }) => {
    if (!can(role, 'calibration.manage')) return null;
    const count = await Scale.count({ where: { status: 'locked' } });
    return { key: 'scales-locked', title: 'Scales locked out', count, detail: 'Test them or take them out of use', href: '/scales' };
  },
  async ({ role }) => {
    if (!can(role, 'calibration.manage')) return null;
    const soon = shiftDay(siteDay(await siteTimeZone()), DUE_SOON_DAYS);
    const count = await Scale.count({ where: { status: { [Op.ne]: 'locked' }, [Op.or]: [{ status: 'due' }, { calibrationDueAt: { [Op.lte]: soon } }] } });
    return { key: 'scales-due', title: 'Scales due for calibration', count, detail: `Due within ${DUE_SOON_DAYS} days; locked once overdue`, href: '/scales' };
  },
  async ({ role }) => {
    if (!can(role, 'audits.run')) return null;
    const count = await Audit.count({ where: { status: 'open' } });
    return { key: 'audits-open', title: 'Count audits still open', count, detail: 'Recounts to key in', href: '/quality/audits' };
  },
];
