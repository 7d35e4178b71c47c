import { z } from 'zod';
import { csvResponse } from '@/server/http/csv-response';
import { route } from '@/server/http/route';
import { accuracyReport } from '@/server/services/audits/accuracy-report';

const query = z.object({
  from: z.iso.date({ error: 'from must be a date (YYYY-MM-DD)' }),
  to: z.iso.date({ error: 'to must be a date (YYYY-MM-DD)' }),
  by: z.enum(['part', 'operator', 'scale', 'week'], { error: 'by must be part, operator, scale or week' }).default('part'),
  format: z.enum(['json', 'csv']).default('json'),
});

export const GET = route({ access: 'audits.run', query }, async ({ query: q }) => {
  const rows = await accuracyReport(q);
  if (q.format === 'json') return { rows };
  const header = [
    'group',
    'recounts',
    'nonconforming',
    'error_rate',
    'mean_abs_error_pcs',
    'mean_abs_error_pct',
    'exact_flagged',
    'exact_right',
    'exact_right_share',
  ];
  const body = rows.map((r) => [
    r.label,
    r.recounts,
    r.nonconforming,
    r.errorRate,
    r.meanAbsError,
    r.meanAbsErrorPct,
    r.exactFlagged,
    r.exactRight,
    r.exactRightShare ?? '',
  ]);
  return csvResponse(header, body, `accuracy-by-${q.by}-${q.from}-to-${q.to}.csv`);
});
