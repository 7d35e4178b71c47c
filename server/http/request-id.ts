// A caller's own X-Request-Id is kept when it is a plain token, so a retry can be traced end to end;
// otherwise the request gets a fresh one.
export function requestIdOf(headers: Headers): string {
  const offered = headers.get('x-request-id');
  return offered && /^[\w.:-]{1,100}$/.test(offered) ? offered : crypto.randomUUID();
}
