import 'server-only';
import { User } from '@/models';
import { verifyPassword } from '../../auth/passwords';
import type { SessionUser } from '../../auth/session';
import { getDb } from '../../db';
import { AppError } from '../../errors';
import { assertNotThrottled, clearFailures, recordFailure, throttleKeys } from './sign-in-throttle';

export interface SignInOptions {
  email: string;
  password: string;
  address: string;
}

export async function signIn({ email, password, address }: SignInOptions): Promise<SessionUser> {
  getDb();
  const keys = throttleKeys(email, address);
  await assertNotThrottled(keys);
  const user = await User.findOne({ where: { email: email.toLowerCase() } });
  const ok = await verifyPassword(password, user?.passwordHash ?? null);
  if (!user || !ok || !user.active) {
    await recordFailure(keys);
    throw new AppError('invalid_credentials', 'That e-mail and password do not match an active account');
  }
  await clearFailures(keys[0].key);
  return { id: user.id, email: user.email, name: user.name, role: user.role };
}
