import { route } from '@/server/http/route';
import { checkHealth } from '@/server/services/health/check-health';

export const dynamic = 'force-dynamic';

export const GET = route({ access: 'public' }, async () => {
  const health = await checkHealth();
  return Response.json(health, { status: health.database === 'ok' ? 200 : 503 });
});
