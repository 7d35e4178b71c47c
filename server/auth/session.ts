import 'server-only';
import { createHash, randomBytes } from 'node:crypto';
import { cache } from 'react';
import { cookies } from 'next/headers';
import { getIronSession, unsealData, type IronSession } from 'iron-session';
import { Op, QueryTypes, type Transaction } from 'sequelize';
import { UserSession } from '@/models';
import type { SessionEndReason } from '@/models/user-session';
import type { Role } from '@/lib/roles';
import { getDb } from '../db';
import { getSettings } from '../services/settings/get-settings';
import { IDLE_LIMIT_MS, isIdleExpired, REFRESH_AFTER_MS, SESSION_COOKIE, sessionOptions, type SessionData } from './session-options';

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

// Opening a seal costs several WebCrypto calls (key derivation, HMAC, AES) on every request. The same
// sealed value always opens to the same data, so what a cookie opened to is kept for a minute (the
// cookie is rolled about as often), in a bounded map. The session row still decides on every request.
const OPENED_FOR_MS = 60_000;
const OPENED_MAX = 5_000;
const opened = new Map<string, { data: SessionData; until: number }>();

async function openSession(): Promise<SessionData> {
  const sealed = (await cookies()).get(SESSION_COOKIE)?.value;
  if (!sealed) return {};
  const now = Date.now();
  const kept = opened.get(sealed);
  if (kept && kept.until > now) return kept.data;
  const options = sessionOptions();
  const data = await unsealData<SessionData>(sealed, { password: options.password, ttl: options.ttl });
  if (opened.size >= OPENED_MAX) opened.delete(opened.keys().next().value!);
  opened.set(sealed, { data, until: now + OPENED_FOR_MS });
  return data;
}

interface SessionRow {
  sessionId: number;
  endedAt: Date | null;
  expiresAt: Date;
  lastSeenAt: Date;
  userId: number;
  email: string;
  name: string;
  role: Role;
  active: number;
  hasPassword: number;
}

// Read once per request. The cookie only names a session: the row decides. An ended, expired or
// idle session, or a switched-off person, counts as signed out at once.
export const getCurrentUser = cache(async (): Promise<CurrentUser | null> => {
  const session = await openSession();
  const now = Date.now();
  if (!session.sid || isIdleExpired(session, now)) return null;
  // One round trip, without building model instances: this runs before every signed-in request.
  const [row] = await getDb().query<SessionRow>(
    `SELECT s.id AS sessionId, s.ended_at AS endedAt, s.expires_at AS expiresAt, s.last_seen_at AS lastSeenAt,
            u.id AS userId, u.email, u.name, u.role, u.active, u.password_hash IS NOT NULL AS hasPassword
       FROM user_sessions s JOIN users u ON u.id = s.user_id
      WHERE s.token_hash = ?`,
    { replacements: [hashSid(session.sid)], type: QueryTypes.SELECT },
  );
  if (!row || row.endedAt || row.expiresAt.getTime() <= now || now - row.lastSeenAt.getTime() > IDLE_LIMIT_MS) return null;
  if (!row.active || !row.hasPassword) return null;
  // The idle clock on the row moves at most once a minute, not with every request.
  if (now - row.lastSeenAt.getTime() > REFRESH_AFTER_MS) await UserSession.update({ lastSeenAt: new Date(now) }, { where: { id: row.sessionId } });
  return { id: row.userId, email: row.email, name: row.name, role: row.role, sessionId: row.sessionId };
});

export async function startSession(userId: number): Promise<void> {
  const { sessionHours } = await getSettings();
  const sid = randomBytes(32).toString('base64url');
  const now = Date.now();
  await UserSession.create({
    tokenHash: hashSid(sid),
    userId,
    lastSeenAt: new Date(now),
    expiresAt: new Date(now + sessionHours * 3_600_000),
    endedAt: null,
    endReason: null,
  });
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
  const [ended] = await UserSession.update(
    { endedAt: new Date(), endReason: reason },
    { where: { userId, endedAt: null, expiresAt: { [Op.gt]: new Date() } }, transaction },
  );
  return ended;
}

/**
 * Rolls the cookie's idle clock forward, at most once a minute, for a signed-in request to the API (pages
 * get theirs in proxy.ts): a bench that only talks to the API all shift keeps its session.
 */
export async function keepSessionFresh(): Promise<void> {
  const now = Date.now();
  const data = await openSession();
  if (!data.sid || now - (data.seenAt ?? 0) <= REFRESH_AFTER_MS) return;
  const session = await getSession();
  session.seenAt = now;
  await session.save();
}
