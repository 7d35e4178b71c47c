import { route } from '@/server/http/route';

export const dynamic = 'force-dynamic';

// Liveness: the app process answers, without asking the database. A process manager restarts on this
// one; GET /api/v1/health is readiness (it pings the database) for a load balancer to route on.
export const GET = route({ access: 'public' }, async () => ({ app: 'ok' }));
