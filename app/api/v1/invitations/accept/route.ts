import { startSession } from '@/server/auth/session';
import { CREDENTIALS_BODY_LIMIT } from '@/server/http/read-body';
import { route } from '@/server/http/route';
import { acceptInvitationSchema } from '@/lib/contracts/session';
import { acceptInvitation } from '@/server/services/users/accept-invitation';

export const POST = route({ access: 'public', body: acceptInvitationSchema, maxBodyBytes: CREDENTIALS_BODY_LIMIT }, async ({ body }) => {
  const user = await acceptInvitation(body);
  await startSession(user.id);
  return { user };
});
