import { route } from '@/server/http/route';
import { idParamSchema } from '@/lib/contracts/common';
import { signOutPerson } from '@/server/services/users/sign-out-person';

export const DELETE = route({ access: 'admin.manage', params: idParamSchema }, async ({ params }) => signOutPerson({ userId: params.id }));
