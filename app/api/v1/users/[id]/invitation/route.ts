import { route } from '@/server/http/route';
import { idParamSchema } from '@/lib/contracts/common';
import { sendPasswordLink } from '@/server/services/users/send-password-link';

export const POST = route({ access: 'admin.manage', params: idParamSchema }, async ({ params, user }) => sendPasswordLink({ userId: params.id, by: user }));
