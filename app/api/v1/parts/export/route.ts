import { siteDay } from '@/lib/time/site-clock';
import { csvResponse } from '@/server/http/csv-response';
import { route } from '@/server/http/route';
import { exportPartsSchema } from '@/lib/contracts/parts';
import { exportPartsTable } from '@/server/services/parts/export-parts-table';
import { siteTimeZone } from '@/server/services/settings/get-settings';

export const GET = route({ access: 'catalog.read', query: exportPartsSchema }, async ({ query }) => {
  const { header, rows } = await exportPartsTable(query);
  return csvResponse(header, rows, `parts-${siteDay(await siteTimeZone())}.csv`);
});
