import { route } from '@/server/http/route';
import { idParamSchema } from '@/server/schemas/common';
import { updateUserSchema } from '@/server/schemas/users';
import { updateUser } from '@/server/services/users/update-user';

export const PATCH = route({ access: 'admin.manage', params: idParamSchema, body: updateUserSchema }, async ({ params, body, user }) => ({
  user: await updateUser({ userId: params.id, input: body, by: user }),
}));
