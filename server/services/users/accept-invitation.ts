import 'server-only';
import { Op } from 'sequelize';
import { PasswordToken, User } from '@/models';
import { hashPassword } from '../../auth/passwords';
import { endSessionsOf, type SessionUser } from '../../auth/session';
import { getDb } from '../../db';
import { AppError } from '../../errors';
import type { AcceptInvitationInput } from '@/lib/contracts/session';
import { hashToken } from './issue-password-token';

const expired = () =>
  new AppError('rule_violated', 'This link has expired or was already used; ask an administrator for a new one', {
    fields: { token: 'expired or already used' },
  });

// Sets the password from a one-time link. A token that is not live is refused before the password is
// hashed, so guessing tokens costs the server an index lookup, not a bcrypt round. The token row is
// then locked, so a double submit uses it once. A new password ends every session signed in with the old one.
export async function acceptInvitation({ token, password }: AcceptInvitationInput): Promise<SessionUser> {
  const db = getDb();
  const live = () => ({ tokenHash: hashToken(token), usedAt: null, expiresAt: { [Op.gt]: new Date() } });
  if (!(await PasswordToken.count({ where: live() }))) throw expired();
  const passwordHash = await hashPassword(password);
  return db.transaction(async (transaction) => {
    const row = await PasswordToken.findOne({ where: live(), transaction, lock: transaction.LOCK.UPDATE });
    const user = row ? await User.findByPk(row.userId, { transaction, lock: transaction.LOCK.UPDATE }) : null;
    if (!row || !user || !user.active) throw expired();
    await row.update({ usedAt: new Date() }, { transaction });
    user.passwordHash = passwordHash;
    await user.save({ transaction });
    await endSessionsOf(user.id, 'password_changed', transaction);
    return { id: user.id, email: user.email, name: user.name, role: user.role };
  });
}
