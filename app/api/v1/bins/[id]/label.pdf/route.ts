import { pdfResponse } from '@/server/http/pdf-response';
import { route } from '@/server/http/route';
import { idParamSchema } from '@/lib/contracts/common';
import { binLabelQuerySchema } from '@/lib/contracts/labels';
import { renderLabelPdf } from '@/server/services/labels/render-label-pdf';

export const GET = route({ access: 'labels.print', params: idParamSchema, query: binLabelQuerySchema }, async ({ params, query }) => {
  const { pdf, filename, unprintable } = await renderLabelPdf({ template: 'bin', stock: query.stock, ids: [params.id] });
  return pdfResponse(pdf, filename, unprintable);
});
