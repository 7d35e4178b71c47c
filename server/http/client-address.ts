import 'server-only';
import type { NextRequest } from 'next/server';

// The address the sign-in throttle counts against. Next fills X-Forwarded-For from the socket
// only when the request has none, so without a reverse proxy that overwrites the header a client
// can choose this value; the per-account limit holds regardless (see README, "Running it for real").
export function clientAddress(req: NextRequest): string {
  const first = (req.headers.get('x-forwarded-for') ?? '').split(',')[0]?.trim();
  return first ? first.slice(0, 64) : 'unknown';
}
