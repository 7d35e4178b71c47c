import 'server-only';
import type { NextRequest } from 'next/server';
import { AppError } from '../errors';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

// State-changing requests from another site are refused. Browsers send Origin on such requests;
// tools without a browser (no Origin) cannot ride a visitor's cookie, so they pass.
export function rejectCrossSite(req: NextRequest): void {
  if (SAFE.has(req.method)) return;
  if (req.headers.get('sec-fetch-site') === 'cross-site') throw new AppError('cross_site', 'Cross-site requests are not accepted');
  const origin = req.headers.get('origin');
  if (!origin) return;
  const host = req.headers.get('x-forwarded-host') ?? req.headers.get('host');
  let originHost: string;
  try {
    originHost = new URL(origin).host;
  } catch {
    throw new AppError('cross_site', 'Cross-site requests are not accepted');
  }
  if (originHost !== host) throw new AppError('cross_site', 'Cross-site requests are not accepted');
}
