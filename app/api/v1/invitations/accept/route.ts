import { startSession } from '@/server/auth/session';
import { route } from '@/server/http/route';
import { acceptInvitationSchema } from '@/server/schemas/session';
import { acceptInvitation } from '@/server/services/users/accept-invitation';

export const POST = route({ access: 'public', body: acceptInvitationSchema }, async ({ body }) => {
  const user = await acceptInvitation(body);
  await startSession(user.id);
  return { user };
});
