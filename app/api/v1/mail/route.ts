import { route } from '@/server/http/route';
import { listMail } from '@/server/services/mail/list-mail';

export const GET = route({ access: 'admin.manage' }, async () => ({ messages: await listMail() }));
