import 'server-only';
import { redirect } from 'next/navigation';
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

// For pages: send signed-out visitors to sign-in and the wrong role to the explanation page.
export async function requirePageUser(permission?: Permission, from = '/'): Promise<SessionUser> {
  const user = await getCurrentUser();
  if (!user) redirect(`/sign-in?next=${encodeURIComponent(from)}`);
  if (permission && !can(user.role, permission)) redirect(`/forbidden?need=${encodeURIComponent(permission)}`);
  return user;
}
