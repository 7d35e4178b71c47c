import { route } from '@/server/http/route';
import { idParamSchema } from '@/lib/contracts/common';
import { updateUserSchema } from '@/lib/contracts/users';
import { updateUser } from '@/server/services/users/update-user';

export const PATCH = route({ access: 'admin.manage', params: idParamSchema, body: updateUserSchema }, async ({ params, body, user }) => ({
  user: await updateUser({ userId: params.id, input: body, by: user }),
}));
