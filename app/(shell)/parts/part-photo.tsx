'use client';

import { useRef, useState } from 'react';
import { CONTENT_TYPES, MAX_UPLOAD_BYTES } from '@/lib/file-kind';
import type { PartDto } from '@/lib/contracts/parts';
import { apiFetch } from '../../_components/api-client';

const ACCEPT = [CONTENT_TYPES.jpeg, CONTENT_TYPES.png, CONTENT_TYPES.webp].join(',');

// Shows a part's photo and replaces it. The server checks the bytes again; the checks here only
// save the operator a wasted upload.
export function PartPhoto({ part, onSaved }: { part: PartDto; onSaved: (p: PartDto) => void }) {
  const input = useRef<HTMLInputElement>(null);
  const [message, setMessage] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function upload(file: File) {
    setMessage(null);
    if (!ACCEPT.split(',').includes(file.type)) return setMessage('Choose a JPEG, PNG or WebP picture.');
    if (file.size > MAX_UPLOAD_BYTES) return setMessage(`That file is ${(file.size / 1048576).toFixed(1)} MB; the limit is ${MAX_UPLOAD_BYTES / 1048576} MB.`);
    const body = new FormData();
    body.set('photo', file);
    setBusy(true);
    const res = await apiFetch<{ part: PartDto }>(`/api/v1/parts/${part.id}/photo`, { method: 'PUT', body });
    setBusy(false);
    if (input.current) input.current.value = '';
    if (!res.ok) return setMessage(res.fields.photo ? `${res.message}: ${res.fields.photo}.` : res.message);
    setMessage('Photo saved.');
    onSaved(res.data.part);
  }

  return (
    <div className="md:col-span-3 flex flex-wrap items-center gap-4" data-testid="part-photo">
      {part.hasPhoto ? (
        // A signed-in route, not a public file: next/image would fetch it without the session.
        // eslint-disable-next-line @next/next/no-img-element -- see above
        <img
          src={`/api/v1/parts/${part.id}/photo?v=${part.version}`}
          alt={`Photo of ${part.partNumber}`}
          className="h-24 w-24 rounded border border-paper-line object-cover"
        />
      ) : (
        <div className="flex h-24 w-24 items-center justify-center rounded border border-dashed border-paper-line text-xs text-ink-faint">No photo</div>
      )}
      <div>
        <label htmlFor={`photo-${part.id}`} className="field-label">
          {part.hasPhoto ? 'Replace photo' : 'Add a photo'}
        </label>
        <input
          ref={input}
          id={`photo-${part.id}`}
          type="file"
          accept={ACCEPT}
          disabled={busy}
          className="text-sm"
          onChange={(e) => {
            const file = e.target.files?.[0];
            if (file) void upload(file);
          }}
        />
        <p className="text-xs text-ink-faint">JPEG, PNG or WebP, at most {MAX_UPLOAD_BYTES / 1048576} MB. Helps the bench tell look-alike parts apart.</p>
        <p role="status" aria-live="polite" className="min-h-5 text-sm text-ink-soft">
          {busy ? 'Uploading…' : message}
        </p>
      </div>
    </div>
  );
}
