import { route } from '@/server/http/route';
import { binsDue } from '@/server/services/bins/bins-due';

export const GET = route({ access: 'catalog.read' }, async () => ({ bins: await binsDue() }));
