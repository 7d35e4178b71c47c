import 'server-only';
import { User } from '@/models';
import { getDb } from '../../db';
import { getEnv } from '../../env';
import { AppError } from '../../errors';
import { zodFields } from '../../http/zod-fields';
import { inviteUserSchema } from '@/lib/contracts/users';
import { issuePasswordToken } from './issue-password-token';

export interface CreateAdminResult {
  email: string;
  created: boolean;
  link: string;
  expiresAt: Date;
}

/**
 * For whoever runs the server: an administrator with a one-time link to choose a password, printed
 * rather than mailed (mail may not be set up yet). Run for an existing administrator, it gives them a
 * fresh link, the way back in for a shop whose only admin lost their password.
 */
export async function createAdmin(input: { email: string; name: string }): Promise<CreateAdminResult> {
  const parsed = inviteUserSchema.safeParse({ ...input, role: 'admin' });
  if (!parsed.success) {
    throw new AppError('validation_failed', 'Some fields need attention', { fields: zodFields(parsed.error) });
  }
  const { email, name } = parsed.data;
  return getDb().transaction(async (transaction) => {
    const existing = await User.findOne({ where: { email }, transaction, lock: transaction.LOCK.UPDATE });
    if (existing && (existing.role !== 'admin' || !existing.active)) {
      throw new AppError(
        'conflict',
        `${email} already has an account (${existing.active ? existing.role : 'switched off'}); an administrator can change it on People`,
      );
    }
    const user = existing ?? (await User.create({ email, name, role: 'admin', passwordHash: null }, { transaction }));
    const { token, expiresAt } = await issuePasswordToken(user.id, transaction);
    return { email, created: !existing, link: `${getEnv().APP_URL}/set-password?token=${token}`, expiresAt };
  });
}
