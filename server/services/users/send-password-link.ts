import 'server-only';
import { formatSiteDateTime } from '@/lib/time/site-clock';
import { User } from '@/models';
import type { SessionUser } from '../../auth/session';
import { getDb } from '../../db';
import { getEnv } from '../../env';
import { AppError, notFound } from '../../errors';
import { sendMail } from '../../mail/send-mail';
import { passwordResetMail } from '../../mail/templates/password-reset';
import { siteTimeZone } from '../settings/get-settings';
import { sendInvitation } from './invite-user';
import { issuePasswordToken } from './issue-password-token';

export type PasswordLinkKind = 'invitation' | 'password_reset';

// Someone still invited gets their invitation again; someone with a password gets a reset link. Either
// way the link goes only to their own inbox (the outbox masks it), so an admin cannot use it unseen.
export async function sendPasswordLink({ userId, by }: { userId: number; by: SessionUser }): Promise<{ mail: string; kind: PasswordLinkKind }> {
  const db = getDb();
  const { user, token, expiresAt } = await db.transaction(async (transaction) => {
    const found = await User.findByPk(userId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!found) throw notFound('User');
    if (!found.active) throw new AppError('rule_violated', 'Switch the person on before sending them a link');
    return { user: found, ...(await issuePasswordToken(found.id, transaction)) };
  });
  if (!user.passwordHash) return { mail: await sendInvitation(user, token, expiresAt, by.name), kind: 'invitation' };
  const link = `${getEnv().APP_URL}/set-password?token=${token}`;
  const message = passwordResetMail({ name: user.name, link, expiresAt: formatSiteDateTime(expiresAt, await siteTimeZone()), sentBy: by.name });
  return { mail: await sendMail({ kind: 'password_reset', to: [user.email], ...message, secrets: [link] }), kind: 'password_reset' };
}
