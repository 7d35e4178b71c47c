import 'server-only';
import { Op } from 'sequelize';
import { MailMessage, User } from '@/models';
import { can, type Role } from '@/lib/roles';
import { siteDay } from '@/lib/time/site-clock';
import { getDb } from '../../db';
import { siteTimeZone } from '../settings/get-settings';
import { plannerWaiting } from './planner-waiting';
import { QUALITY_SOURCES } from './quality-sources';
import { queueWaiting } from './queue-waiting';
import { STOCK_SOURCES } from './stock-sources';
import type { WaitingItem, WaitingSource } from './waiting-item';

export type { WaitingItem } from './waiting-item';

const ADMIN_SOURCES: WaitingSource[] = [
  async ({ role }) => {
    if (role !== 'admin') return null;
    const count = await User.count({ where: { passwordHash: null, active: true } });
    return { key: 'invites', title: 'Invitations not yet accepted', count, detail: 'People who have not set a password yet', href: '/admin/users' };
  },
  async ({ role }) => {
    if (role !== 'admin') return null;
    const since = new Date(Date.now() - 7 * 24 * 3600 * 1000);
    const count = await MailMessage.count({ where: { status: 'failed', createdAt: { [Op.gte]: since } } });
    return { key: 'mail', title: 'E-mails that failed this week', count, detail: 'Check the mail relay settings', href: '/admin/mail' };
  },
];

const WORK_SOURCES: WaitingSource[] = [
  async ({ role }) => (can(role, 'orders.manage') ? plannerWaiting(siteDay(await siteTimeZone())) : null),
  async ({ role }) => (role === 'operator' || role === 'admin' ? queueWaiting() : null),
];

const SOURCES: WaitingSource[] = [...WORK_SOURCES, ...QUALITY_SOURCES, ...STOCK_SOURCES, ...ADMIN_SOURCES];

export async function getWaiting(user: { id: number; role: Role }): Promise<WaitingItem[]> {
  getDb();
  const items = await Promise.all(SOURCES.map((s) => s(user)));
  return items.flat().filter((i): i is WaitingItem => i !== null && i.count > 0);
}
