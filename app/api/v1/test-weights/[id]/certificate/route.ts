import { readUploadForm } from '@/server/http/read-body';
import { route } from '@/server/http/route';
import { idParamSchema } from '@/lib/contracts/common';
import { readCertificate, saveCertificate } from '@/server/services/calibration/test-weight-certificate';

export const GET = route({ access: 'catalog.read', params: idParamSchema }, async ({ params }) => {
  const { bytes, identifier } = await readCertificate({ testWeightId: params.id });
  return new Response(new Uint8Array(bytes), {
    headers: {
      'Content-Type': 'application/pdf',
      'Content-Disposition': `inline; filename="certificate-${identifier}.pdf"`,
      'X-Content-Type-Options': 'nosniff',
    },
  });
});

// multipart/form-data with one field "certificate" (a PDF, at most 5 MB).
export const PUT = route({ access: 'calibration.manage', params: idParamSchema }, async ({ req, params }) => {
  const form = await readUploadForm(req, 'certificate', 'certificate');
  return { testWeight: await saveCertificate({ testWeightId: params.id, file: form.get('certificate') }) };
});
