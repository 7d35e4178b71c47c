import { route } from '@/server/http/route';
import { idParamSchema } from '@/server/schemas/common';
import { resendInvitation } from '@/server/services/users/resend-invitation';

export const POST = route({ access: 'admin.manage', params: idParamSchema }, async ({ params, user }) =>
  resendInvitation({ userId: params.id, by: user }),
);
