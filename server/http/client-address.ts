import 'server-only';
import type { NextRequest } from 'next/server';
import proxyaddr from 'proxy-addr';
import { PEER_HEADER } from '@/lib/internal-headers';
import { getEnv } from '../env';

let trust: ((addr: string, i: number) => boolean) | undefined;

// The address the sign-in limits count against: the socket's (set by scripts/serve.ts), or, when that
// is one of TRUSTED_PROXIES, the nearest X-Forwarded-For entry that is not (proxy-addr's rule).
export function clientAddress(req: NextRequest): string {
  trust ??= proxyaddr.compile(getEnv().TRUSTED_PROXIES);
  const peer = req.headers.get(PEER_HEADER);
  if (!peer) return 'unknown';
  const forwarded = req.headers.get('x-forwarded-for') ?? undefined;
  // proxy-addr reads a Node request; these are the only two things it looks at.
  const nodeLike = { socket: { remoteAddress: peer }, connection: { remoteAddress: peer }, headers: { 'x-forwarded-for': forwarded } };
  return proxyaddr(nodeLike as unknown as Parameters<typeof proxyaddr>[0], trust).slice(0, 64);
}
