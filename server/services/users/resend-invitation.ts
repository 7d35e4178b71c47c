import 'server-only';
import { User } from '@/models';
import type { SessionUser } from '../../auth/session';
import { getDb } from '../../db';
import { AppError, notFound } from '../../errors';
import { sendInvitation } from './invite-user';
import { issuePasswordToken } from './issue-password-token';

export async function resendInvitation({ userId, by }: { userId: number; by: SessionUser }): Promise<{ mail: string }> {
  const db = getDb();
  const { user, token, expiresAt } = await db.transaction(async (transaction) => {
    const found = await User.findByPk(userId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!found) throw notFound('User');
    if (!found.active) throw new AppError('rule_violated', 'Reactivate the user before sending an invitation');
    return { user: found, ...(await issuePasswordToken(found.id, transaction)) };
  });
  return { mail: await sendInvitation(user, token, expiresAt, by.name) };
}
