import { SESSION_COOKIE } from '../../server/auth/session-options';

// Signs in through the API as a browser would (its own origin on the write) and returns the session cookie.
export async function signIn(url: string, email: string, password: string): Promise<string> {
  const res = await fetch(`${url}/api/v1/session`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: url },
    body: JSON.stringify({ email, password }),
  });
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status} ${await res.text()}`);
  const cookie = res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .find((c) => c.startsWith(`${SESSION_COOKIE}=`));
  if (!cookie) throw new Error('sign-in answered without a session cookie');
  return cookie;
}
