import 'server-only';
import { Op } from 'sequelize';
import { MailMessage, User } from '@/models';
import { can, type Role } from '@/lib/roles';
import { getDb } from '../../db';
import { plannerWaiting } from './planner-waiting';

export interface WaitingItem {
  key: string;
  title: string;
  count: number;
  detail: string;
  href: string;
}

type Source = (role: Role) => Promise<WaitingItem | WaitingItem[] | null>;

// Each source answers for the roles it concerns; the Today page lists the non-empty ones.
const SOURCES: Source[] = [
  async (role) => {
    if (role !== 'admin') return null;
    const count = await User.count({ where: { passwordHash: null, active: true } });
    return { key: 'invites', title: 'Invitations not yet accepted', count, detail: 'People who have not set a password yet', href: '/admin/users' };
  },
  async (role) => {
    if (role !== 'admin') return null;
    const since = new Date(Date.now() - 7 * 24 * 3600 * 1000);
    const count = await MailMessage.count({ where: { status: 'failed', createdAt: { [Op.gte]: since } } });
    return { key: 'mail', title: 'E-mails that failed this week', count, detail: 'Check the mail relay settings', href: '/admin/mail' };
  },
  async (role) => (can(role, 'orders.manage') ? plannerWaiting(new Date().toISOString().slice(0, 10)) : null),
];

export async function getWaiting(role: Role): Promise<WaitingItem[]> {
  getDb();
  const items = await Promise.all(SOURCES.map((s) => s(role)));
  return items.flat().filter((i): i is WaitingItem => i !== null && i.count > 0);
}
