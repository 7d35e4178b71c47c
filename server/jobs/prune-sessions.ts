import 'server-only';
import { Op } from 'sequelize';
import { UserSession } from '@/models';
import { getDb } from '../db';

/** Ended and expired sessions are kept a month (who was signed in when), then deleted. */
export const SESSION_KEEP_DAYS = 30;

export async function pruneSessions(now = new Date()): Promise<number> {
  getDb();
  const before = new Date(now.getTime() - SESSION_KEEP_DAYS * 86_400_000);
  return UserSession.destroy({ where: { [Op.or]: [{ endedAt: { [Op.lt]: before } }, { expiresAt: { [Op.lt]: before } }] } });
}
