import { created, route } from '@/server/http/route';
import { inviteUserSchema } from '@/lib/contracts/users';
import { inviteUser } from '@/server/services/users/invite-user';
import { listUsers } from '@/server/services/users/list-users';

export const GET = route({ access: 'admin.manage' }, async () => ({ users: await listUsers() }));

export const POST = route({ access: 'admin.manage', body: inviteUserSchema }, async ({ body, user }) =>
  created(await inviteUser({ input: body, invitedBy: user })),
);
