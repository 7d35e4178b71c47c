import 'server-only';
import { User } from '@/models';
import { endSessionsOf } from '../../auth/session';
import { getDb } from '../../db';
import { notFound } from '../../errors';

// An administrator signs a person out on every device (a lost tablet, a shared password).
export async function signOutPerson({ userId }: { userId: number }): Promise<{ ended: number }> {
  getDb();
  if (!(await User.findByPk(userId, { attributes: ['id'] }))) throw notFound('User');
  return { ended: await endSessionsOf(userId, 'ended_by_admin') };
}
