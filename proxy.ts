import { NextResponse, type NextRequest } from 'next/server';
import { sealData, unsealData } from 'iron-session';
import { isIdleExpired, REFRESH_AFTER_MS, SESSION_COOKIE, sessionOptions, type SessionData } from '@/server/auth/session-options';
import { isCrossSite } from '@/server/http/reject-cross-site';
import { requestIdOf } from '@/server/http/request-id';
import { PAGE_PATH_HEADER } from '@/lib/internal-headers';

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
  // A cookie that looks live; the server still checks its session row on every request.
  const live = Boolean(data.sid) && !isIdleExpired(data, now);
  // A server action posted from another site: refused here with 403 (Next's own check would answer 500).
  if (req.headers.has('next-action') && isCrossSite(req)) {
    return new NextResponse('Cross-site requests are not accepted', { status: 403, headers: { 'content-type': 'text/plain; charset=utf-8' } });
  }

  if (!live && !PUBLIC_PAGES.includes(pathname)) {
    const target = new URL('/sign-in', req.url);
    if (pathname !== '/') target.searchParams.set('next', pathname + search);
    const res = NextResponse.redirect(target);
    if (sealed) res.cookies.delete(SESSION_COOKIE);
    return res;
  }

  const requestId = requestIdOf(req.headers);
  const res = withContentSecurityPolicy(req, requestId);
  res.headers.set('x-request-id', requestId);
  if (live && now - (data.seenAt ?? 0) > REFRESH_AFTER_MS) {
    const fresh = await sealData({ ...data, seenAt: now }, { password: options.password, ttl: options.ttl });
    res.cookies.set(SESSION_COOKIE, fresh, { ...options.cookieOptions, maxAge: (options.ttl ?? 0) - 60 });
  }
  return res;
}

// A fresh nonce per page: Next puts it on its own scripts, and nothing else may run.
// Inline style attributes stay allowed (React style props, the data grid's sizing).
function withHeader(source: Headers, name: string, value: string): Headers {
  const headers = new Headers(source);
  headers.set(name, value);
  return headers;
}

function withContentSecurityPolicy(req: NextRequest, requestId: string): NextResponse {
  const nonce = Buffer.from(crypto.randomUUID()).toString('base64');
  const policy = [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join('; ');
  const headers = withHeader(req.headers, 'x-request-id', requestId);
  headers.set(PAGE_PATH_HEADER, req.nextUrl.pathname);
  headers.set('x-nonce', nonce);
  headers.set('Content-Security-Policy', policy);
  const res = NextResponse.next({ request: { headers } });
  res.headers.set('Content-Security-Policy', policy);
  return res;
}

// Pages only. Next hands a request to the proxy only after buffering its body (up to 10 MB), so API
// addresses, which take bodies and refuse oversized ones themselves, never pass through here: route()
// gives them their request id and session refresh, and scripts/serve.ts their bad-address answer.
export const config = {
  matcher: ['/((?!api/|_next/static|_next/image|favicon.ico|icon.svg).*)'],
};
