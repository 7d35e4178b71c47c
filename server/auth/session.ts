import 'server-only';
import { createHash, randomBytes } from 'node:crypto';
import { cache } from 'react';
import { cookies } from 'next/headers';
import { getIronSession, type IronSession } from 'iron-session';
import { Op, type Transaction } from 'sequelize';
import { User, UserSession } from '@/models';
import type { SessionEndReason } from '@/models/user-session';
import type { Role } from '@/lib/roles';
import { getDb } from '../db';
import { getSettings } from '../services/settings/get-settings';
import { IDLE_LIMIT_MS, isIdleExpired, REFRESH_AFTER_MS, sessionOptions, type SessionData } from './session-options';

export interface SessionUser {
  id: number;
  email: string;
  name: string;
  role: Role;
}

/** The signed-in person of this request, with the session they signed in with. */
export interface CurrentUser extends SessionUser {
  sessionId: number;
}

const hashSid = (sid: string) => createHash('sha256').update(sid).digest('hex');

export async function getSession(): Promise<IronSession<SessionData>> {
  return getIronSession<SessionData>(await cookies(), sessionOptions());
}

// Read once per request. The cookie only names a session: the row decides. An ended, expired or
// idle session, or a switched-off person, counts as signed out at once.
export const getCurrentUser = cache(async (): Promise<CurrentUser | null> => {
  const session = await getSession();
  const now = Date.now();
  if (!session.sid || isIdleExpired(session, now)) return null;
  getDb();
  const row = (await UserSession.findOne({ where: { tokenHash: hashSid(session.sid) }, include: [{ model: User, as: 'user' }] })) as (UserSession & { user: User | null }) | null;
  if (!row || row.endedAt || row.expiresAt.getTime() <= now || now - row.lastSeenAt.getTime() > IDLE_LIMIT_MS) return null;
  const user = row.user;
  if (!user || !user.active || !user.passwordHash) return null;
  // The idle clock on the row moves at most once a minute, not with every request.
  if (now - row.lastSeenAt.getTime() > REFRESH_AFTER_MS) await UserSession.update({ lastSeenAt: new Date(now) }, { where: { id: row.id } });
  return { id: user.id, email: user.email, name: user.name, role: user.role, sessionId: row.id };
});

export async function startSession(userId: number): Promise<void> {
  const { sessionHours } = await getSettings();
  const sid = randomBytes(32).toString('base64url');
  const now = Date.now();
  await UserSession.create({ tokenHash: hashSid(sid), userId, lastSeenAt: new Date(now), expiresAt: new Date(now + sessionHours * 3_600_000), endedAt: null, endReason: null });
  const session = await getSession();
  session.sid = sid;
  session.seenAt = now;
  await session.save();
}

/** Signs this browser out: its session row is ended, so a copy of the cookie is worth nothing. */
export async function endSession(): Promise<void> {
  const session = await getSession();
  if (session.sid) {
    getDb();
    await UserSession.update({ endedAt: new Date(), endReason: 'signed_out' }, { where: { tokenHash: hashSid(session.sid), endedAt: null } });
  }
  session.destroy();
}

/** Ends every open session of a person (password changed, switched off, role changed, or asked for). */
export async function endSessionsOf(userId: number, reason: SessionEndReason, transaction?: Transaction): Promise<number> {
  getDb();
  const [ended] = await UserSession.update({ endedAt: new Date(), endReason: reason }, { where: { userId, endedAt: null, expiresAt: { [Op.gt]: new Date() } }, transaction });
  return ended;
}

/**
 * Rolls the cookie's idle clock forward, at most once a minute, for a signed-in request to the API (pages
 * get theirs in proxy.ts): a bench that only talks to the API all shift keeps its session.
 */
export async function keepSessionFresh(): Promise<void> {
  const session = await getSession();
  const now = Date.now();
  if (!session.sid || now - (session.seenAt ?? 0) <= REFRESH_AFTER_MS) return;
  session.seenAt = now;
  await session.save();
}
