import 'server-only';
import { User } from '@/models';
import { endSessionsOf, type SessionUser } from '../../auth/session';
import { getDb } from '../../db';
import { AppError, notFound } from '../../errors';
import type { UpdateUserInput, UserDto } from '@/lib/contracts/users';
import { toUserDto } from './user-dto';

export interface UpdateUserOptions {
  userId: number;
  input: UpdateUserInput;
  by: SessionUser;
}

// Role changes and (de)activation. An admin cannot lock themselves out by editing their own account.
// Either ends the person's sessions, in the same transaction: a new role is taken up by signing in
// again, and a switched-off person's cookie never works again, even after switching back on.
export async function updateUser({ userId, input, by }: UpdateUserOptions): Promise<UserDto> {
  const db = getDb();
  return db.transaction(async (transaction) => {
    const user = await User.findByPk(userId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!user) throw notFound('User');
    if (user.version !== input.version) throw new AppError('stale_version', 'Someone else changed this user; reload and try again');
    if (user.id === by.id) throw new AppError('rule_violated', 'You cannot change your own role or deactivate yourself');
    const roleChanged = input.role !== undefined && input.role !== user.role;
    const switchedOff = input.active === false && user.active;
    if (input.role !== undefined) user.role = input.role;
    if (input.active !== undefined) user.active = input.active;
    await user.save({ transaction });
    if (switchedOff) await endSessionsOf(user.id, 'switched_off', transaction);
    else if (roleChanged) await endSessionsOf(user.id, 'role_changed', transaction);
    return toUserDto(user);
  });
}
