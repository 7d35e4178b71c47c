import { route } from '@/server/http/route';
import { exportPartsSchema } from '@/server/schemas/parts';
import { exportPartsCsv } from '@/server/services/parts/export-parts-csv';

export const GET = route({ access: 'catalog.read', query: exportPartsSchema }, async ({ query }) => {
  const csv = await exportPartsCsv(query);
  const day = new Date().toISOString().slice(0, 10);
  return new Response(csv, {
    headers: { 'Content-Type': 'text/csv; charset=utf-8', 'Content-Disposition': `attachment; filename="parts-${day}.csv"`, 'Cache-Control': 'no-store' },
  });
});
