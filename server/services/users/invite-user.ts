import 'server-only';
import { formatSiteDateTime } from '@/lib/time/site-clock';
import { User } from '@/models';
import type { SessionUser } from '../../auth/session';
import { getDb } from '../../db';
import { getEnv } from '../../env';
import { AppError } from '../../errors';
import { sendMail } from '../../mail/send-mail';
import { invitationMail } from '../../mail/templates/invitation';
import type { InviteUserInput, UserDto } from '@/lib/contracts/users';
import { siteTimeZone } from '../settings/get-settings';
import { issuePasswordToken } from './issue-password-token';
import { toUserDto } from './user-dto';

export interface InviteUserOptions {
  input: InviteUserInput;
  invitedBy: SessionUser;
}

export async function inviteUser({ input, invitedBy }: InviteUserOptions): Promise<{ user: UserDto; mail: string }> {
  const db = getDb();
  const existing = await User.findOne({ where: { email: input.email } });
  if (existing) throw new AppError('duplicate', 'A user with that e-mail already exists', { fields: { email: 'is already in use' } });
  const { user, token, expiresAt } = await db.transaction(async (transaction) => {
    const created = await User.create({ ...input, passwordHash: null }, { transaction });
    return { user: created, ...(await issuePasswordToken(created.id, transaction)) };
  });
  const mail = await sendInvitation(user, token, expiresAt, invitedBy.name);
  return { user: toUserDto(user), mail };
}

export async function sendInvitation(user: User, token: string, expiresAt: Date, invitedBy: string): Promise<string> {
  const link = `${getEnv().APP_URL}/set-password?token=${token}`;
  const message = invitationMail({ name: user.name, role: user.role, link, expiresAt: formatSiteDateTime(expiresAt, await siteTimeZone()), invitedBy });
  return sendMail({ kind: 'invitation', to: [user.email], ...message, secrets: [link] });
}
