import { readUploadForm } from '@/server/http/read-body';
import { route } from '@/server/http/route';
import { idParamSchema } from '@/lib/contracts/common';
import { readPartPhoto, savePartPhoto } from '@/server/services/parts/part-photo';

// Served only to signed-in users, never from a public folder; the browser may not sniff another type.
export const GET = route({ access: 'catalog.read', params: idParamSchema }, async ({ params }) => {
  const { bytes, contentType } = await readPartPhoto({ partId: params.id });
  return new Response(new Uint8Array(bytes), {
    headers: { 'Content-Type': contentType, 'Cache-Control': 'private, max-age=300', 'X-Content-Type-Options': 'nosniff' },
  });
});

// multipart/form-data with one field "photo" (JPEG, PNG or WebP, at most 5 MB).
export const PUT = route({ access: 'parts.edit', params: idParamSchema }, async ({ req, params }) => {
  const form = await readUploadForm(req, 'photo', 'photo');
  return { part: await savePartPhoto({ partId: params.id, file: form.get('photo') }) };
});
