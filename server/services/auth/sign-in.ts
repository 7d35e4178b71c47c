import 'server-only';
import { setTimeout as sleep } from 'node:timers/promises';
import { User } from '@/models';
import { verifyPassword } from '../../auth/passwords';
import type { SessionUser } from '../../auth/session';
import { getDb } from '../../db';
import { AppError } from '../../errors';
import { admitSignIn, recordSignedIn, recordWrongPassword, throttleKeys } from './sign-in-throttle';

export interface SignInOptions {
  email: string;
  password: string;
  address: string;
}

export async function signIn({ email, password, address }: SignInOptions): Promise<SessionUser> {
  getDb();
  const keys = throttleKeys(email, address);
  const delay = await admitSignIn(keys);
  if (delay > 0) await sleep(delay);
  const user = await User.findOne({ where: { email: email.toLowerCase() } });
  const ok = await verifyPassword(password, user?.passwordHash ?? null);
  if (!user || !ok || !user.active) {
    await recordWrongPassword(keys);
    throw new AppError('invalid_credentials', 'That e-mail and password do not match an active account');
  }
  await recordSignedIn(keys);
  return { id: user.id, email: user.email, name: user.name, role: user.role };
}
