import { endSession, startSession } from '@/server/auth/session';
import { AppError } from '@/server/errors';
import { clientAddress } from '@/server/http/client-address';
import { CREDENTIALS_BODY_LIMIT } from '@/server/http/read-body';
import { route } from '@/server/http/route';
import { signInSchema } from '@/lib/contracts/session';
import { signIn } from '@/server/services/auth/sign-in';

// Refused cheaply: a small body limit, read before anything else is done.
export const POST = route({ access: 'public', body: signInSchema, maxBodyBytes: CREDENTIALS_BODY_LIMIT }, async ({ req, body }) => {
  const user = await signIn({ ...body, address: clientAddress(req) });
  await startSession(user.id);
  return { user };
});

export const GET = route({ access: 'public' }, async ({ user }) => {
  if (!user) throw new AppError('unauthorized', 'Not signed in');
  return { user };
});

export const DELETE = route({ access: 'public' }, async () => {
  await endSession();
});
