import { pdfResponse } from '@/server/http/pdf-response';
import { route } from '@/server/http/route';
import { labelRequestSchema } from '@/lib/contracts/labels';
import { renderLabelPdf } from '@/server/services/labels/render-label-pdf';

// ids are bin ids, part ids, or build order ids for kit labels.
export const POST = route({ access: 'labels.print', body: labelRequestSchema }, async ({ body }) => {
  const { pdf, filename, unprintable } = await renderLabelPdf(body);
  return pdfResponse(pdf, filename, unprintable);
});
