import { endSession, endSessionsOf } from '@/server/auth/session';
import { route } from '@/server/http/route';

// Sign out everywhere: every session of the caller ends, this one included.
export const DELETE = route({ access: 'signed-in' }, async ({ user }) => {
  const ended = await endSessionsOf(user.id, 'signed_out_everywhere');
  await endSession();
  return { ended };
});
