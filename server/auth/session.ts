import 'server-only';
import { cache } from 'react';
import { cookies } from 'next/headers';
import { getIronSession, type IronSession } from 'iron-session';
import { User } from '@/models';
import type { Role } from '@/lib/roles';
import { getDb } from '../db';
import { isIdleExpired, sessionOptions, type SessionData } from './session-options';

export interface SessionUser {
  id: number;
  email: string;
  name: string;
  role: Role;
}

export async function getSession(): Promise<IronSession<SessionData>> {
  return getIronSession<SessionData>(await cookies(), sessionOptions());
}

// Read once per request. A deactivated user or an idle session counts as signed out at once.
export const getCurrentUser = cache(async (): Promise<SessionUser | null> => {
  const session = await getSession();
  if (!session.userId || isIdleExpired(session, Date.now())) return null;
  getDb();
  const user = await User.findByPk(session.userId);
  if (!user || !user.active || !user.passwordHash) return null;
  return { id: user.id, email: user.email, name: user.name, role: user.role };
});

export async function startSession(userId: number): Promise<void> {
  const session = await getSession();
  session.userId = userId;
  session.seenAt = Date.now();
  await session.save();
}

export async function endSession(): Promise<void> {
  const session = await getSession();
  session.destroy();
}
