import 'server-only';
import type { NextRequest } from 'next/server';
import { getEnv } from '../env';
import { AppError } from '../errors';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

// A state-changing request sent by a page of another site. Browsers send Origin on such requests;
// tools without a browser (no Origin) cannot ride a visitor's cookie, so they pass.
export function isCrossSite(req: NextRequest): boolean {
  if (SAFE.has(req.method)) return false;
  if (req.headers.get('sec-fetch-site') === 'cross-site') return true;
  const origin = req.headers.get('origin');
  if (!origin) return false;
  let originHost: string;
  try {
    originHost = new URL(origin).host;
  } catch {
    return true;
  }
  // This site is the host the request was sent to, or the one APP_URL names (a proxy may rewrite Host).
  // X-Forwarded-Host is not believed: a client chooses it.
  return originHost !== req.headers.get('host') && originHost !== new URL(getEnv().APP_URL).host;
}

export function rejectCrossSite(req: NextRequest): void {
  if (isCrossSite(req)) throw new AppError('cross_site', 'Cross-site requests are not accepted');
}
