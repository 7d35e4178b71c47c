import { NextResponse, type NextRequest } from 'next/server';
import { sealData, unsealData } from 'iron-session';
import { isIdleExpired, REFRESH_AFTER_MS, SESSION_COOKIE, sessionOptions, type SessionData } from '@/server/auth/session-options';

const PUBLIC_PAGES = ['/sign-in', '/set-password'];

// Early redirect for signed-out visitors and the rolling idle timeout. Not the access check:
// every page, action and route handler still authorizes on its own.
export async function proxy(req: NextRequest): Promise<NextResponse> {
  const { pathname, search } = req.nextUrl;
  const options = sessionOptions();
  const sealed = req.cookies.get(SESSION_COOKIE)?.value;
  const now = Date.now();
  let data: SessionData = {};
  if (sealed) {
    try {
      data = await unsealData<SessionData>(sealed, { password: options.password, ttl: options.ttl });
    } catch {
      data = {};
    }
  }
  const live = Boolean(data.userId) && !isIdleExpired(data, now);
  const isApi = pathname.startsWith('/api/');

  if (!live && !isApi && !PUBLIC_PAGES.includes(pathname)) {
    const target = new URL('/sign-in', req.url);
    if (pathname !== '/') target.searchParams.set('next', pathname + search);
    const res = NextResponse.redirect(target);
    if (sealed) res.cookies.delete(SESSION_COOKIE);
    return res;
  }

  const res = NextResponse.next();
  if (live && now - (data.seenAt ?? 0) > REFRESH_AFTER_MS) {
    const fresh = await sealData({ ...data, seenAt: now }, { password: options.password, ttl: options.ttl });
    res.cookies.set(SESSION_COOKIE, fresh, { ...options.cookieOptions, maxAge: (options.ttl ?? 0) - 60 });
  }
  return res;
}

export const config = {
  matcher: ['/((?!_next/static|_next/image|favicon.ico|icon.svg).*)'],
};
