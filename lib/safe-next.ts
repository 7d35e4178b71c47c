// Where to go after signing in: only a page of this app. The address is parsed the way a browser
// parses it (WHATWG URL: tabs and newlines dropped, "\" read as "/"), so "/\evil.test" or
// "/<tab>/evil.test" cannot name another host; what is followed is the parsed form that was checked.
const HERE = 'http://tallyforge.invalid';

export function safeNextPath(next: string | null | undefined): string {
  if (typeof next !== 'string' || !next.startsWith('/')) return '/';
  let url: URL;
  try {
    url = new URL(next, HERE);
  } catch {
    return '/';
  }
  if (url.origin !== HERE || url.pathname.startsWith('/api/') || url.pathname.startsWith('//')) return '/';
  return `${url.pathname}${url.search}${url.hash}`;
}
