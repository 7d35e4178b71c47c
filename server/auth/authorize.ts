import 'server-only';
import { headers } from 'next/headers';
import { forbidden, redirect } from 'next/navigation';
import { PAGE_PATH_HEADER } from '@/lib/internal-headers';
import { pagePermission } from '@/lib/page-access';
import { can, type Permission } from '@/lib/roles';
import { AppError } from '../errors';
import { getCurrentUser, type SessionUser } from './session';

// The one authorization helper: route handlers, server actions and pages all come through here.
export async function requireUser(): Promise<SessionUser> {
  const user = await getCurrentUser();
  if (!user) throw new AppError('unauthorized', 'Sign in to continue');
  return user;
}

export async function requirePermission(permission: Permission): Promise<SessionUser> {
  const user = await requireUser();
  if (!can(user.role, permission)) throw new AppError('forbidden', 'Your role does not allow this');
  return user;
}

// For pages: send signed-out visitors to sign-in, and answer the wrong role 403 with the explanation
// (forbidden.tsx).
export async function requirePageUser(permission?: Permission, from = '/'): Promise<SessionUser> {
  const user = await getCurrentUser();
  if (!user) redirect(`/sign-in?next=${encodeURIComponent(from)}`);
  if (permission && !can(user.role, permission)) forbidden();
  return user;
}

/** The page this request asks for (set by proxy.ts). */
export async function requestedPagePath(): Promise<string> {
  return (await headers()).get(PAGE_PATH_HEADER) ?? '/';
}

/**
 * For the shell's layout, which renders before any of the page is sent: the page's permission is
 * checked here too, so a refusal is a real 403 rather than a page that has already begun as a 200.
 */
export async function requireShellUser(): Promise<SessionUser> {
  const path = await requestedPagePath();
  return requirePageUser(pagePermission(path), path);
}
