import { siteDay } from '@/lib/time/site-clock';
import { csvResponse } from '@/server/http/csv-response';
import { route } from '@/server/http/route';
import { countLogQuerySchema } from '@/lib/contracts/counts';
import { countLogTable } from '@/server/services/counting/count-log';
import { siteTimeZone } from '@/server/services/settings/get-settings';

export const GET = route({ access: 'catalog.read', query: countLogQuerySchema }, async ({ query }) => {
  const { header, rows } = await countLogTable(query);
  return csvResponse(header, rows, `count-log-${siteDay(await siteTimeZone())}.csv`);
});
