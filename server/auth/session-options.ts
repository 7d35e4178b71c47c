import 'server-only';
import type { SessionOptions } from 'iron-session';
import { getEnv } from '../env';

export interface SessionData {
  /** A random id naming the session's row (user_sessions); the server can end it at any time. */
  sid?: string;
  // Last time the session was used (ms); the session ends after IDLE_LIMIT_MS without use.
  seenAt?: number;
}

export const SESSION_COOKIE = 'tf_session';
export const IDLE_LIMIT_MS = 8 * 60 * 60 * 1000;
// Refreshing the seal on every request would rewrite the cookie constantly; once a minute is enough.
export const REFRESH_AFTER_MS = 60 * 1000;

export function sessionOptions(): SessionOptions {
  const env = getEnv();
  return {
    cookieName: SESSION_COOKIE,
    password: env.SESSION_SECRET,
    ttl: IDLE_LIMIT_MS / 1000,
    cookieOptions: { httpOnly: true, sameSite: 'lax', secure: env.SECURE_COOKIES === '1', path: '/' },
  };
}

export function isIdleExpired(data: SessionData, now: number): boolean {
  return !data.seenAt || now - data.seenAt > IDLE_LIMIT_MS;
}
