import { AppError } from '@/server/errors';
import { MAX_UPLOAD_BYTES } from '@/lib/file-kind';
import { assertDeclaredSize, UPLOAD_ENVELOPE_BYTES } from '@/server/http/read-body';
import { route } from '@/server/http/route';
import { idParamSchema } from '@/server/schemas/common';
import { readCertificate, saveCertificate } from '@/server/services/calibration/test-weight-certificate';

export const GET = route({ access: 'catalog.read', params: idParamSchema }, async ({ params }) => {
  const { bytes, identifier } = await readCertificate({ testWeightId: params.id });
  return new Response(new Uint8Array(bytes), {
    headers: { 'Content-Type': 'application/pdf', 'Content-Disposition': `inline; filename="certificate-${identifier}.pdf"`, 'X-Content-Type-Options': 'nosniff' },
  });
});

// multipart/form-data with one field "certificate" (a PDF, at most 5 MB).
export const PUT = route({ access: 'calibration.manage', params: idParamSchema }, async ({ req, params }) => {
  assertDeclaredSize(req, MAX_UPLOAD_BYTES + UPLOAD_ENVELOPE_BYTES);
  const form = await req.formData().catch(() => {
    throw new AppError('validation_failed', 'Send the certificate as multipart/form-data', { fields: { certificate: 'a file is required' } });
  });
  return { testWeight: await saveCertificate({ testWeightId: params.id, file: form.get('certificate') }) };
});
