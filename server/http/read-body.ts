import 'server-only';
import { AppError } from '../errors';
import { MAX_UPLOAD_BYTES } from '@/lib/file-kind';
import { isWellFormedText } from '@/lib/well-formed-text';

// Request bodies are read against a limit before anything is parsed: a declared length over it is
// refused (413) without keeping a byte; a body without one is read until it passes the limit.
export const JSON_BODY_LIMIT = 256 * 1024;
/** Sign-in and set-password bodies: an e-mail, a password and a token. */
export const CREDENTIALS_BODY_LIMIT = 8 * 1024;
/** A multipart upload: the file (MAX_UPLOAD_BYTES) and its envelope. */
const UPLOAD_ENVELOPE_BYTES = 64 * 1024;

// A refused body is still read to its end and dropped, up to this much: a client that writes its whole
// body before it reads the answer, on a connection that then closes, would otherwise get a reset instead
// of the 413 (the "lingering close" of RFC 9112 §9.6). Past it, the connection is simply cut.
const DISCARD_LIMIT = 16 * 1024 * 1024;

const tooLarge = (limit: number) => new AppError('payload_too_large', `The request body is larger than this address takes (${Math.round(limit / 1024)} KB)`);

/** The body's bytes, refused (413) past `limit`: from its declared length at once, else once it passes. */
export async function readBodyBytes(req: Request, limit: number): Promise<Buffer> {
  const declared = Number(req.headers.get('content-length') ?? 0);
  if (!req.body) return Buffer.alloc(0);
  const reader = req.body.getReader();
  if (declared > limit) {
    await discardRest(reader, 0);
    throw tooLarge(limit);
  }
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > limit) {
      await discardRest(reader, size);
      throw tooLarge(limit);
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks);
}

async function discardRest(reader: ReadableStreamDefaultReader<Uint8Array>, alreadyRead: number): Promise<void> {
  let size = alreadyRead;
  while (size <= DISCARD_LIMIT) {
    const { done, value } = await reader.read();
    if (done) return;
    size += value.byteLength;
  }
  await reader.cancel();
}

export async function readBodyText(req: Request, limit: number): Promise<string> {
  return (await readBodyBytes(req, limit)).toString('utf8');
}

/**
 * An upload (multipart/form-data carrying one file in `field`), read against the upload limit before it
 * is parsed, so a chunked upload cannot grow without end. `what` names the file in the refusal.
 */
export async function readUploadForm(req: Request, field: string, what: string): Promise<FormData> {
  const bytes = await readBodyBytes(req, MAX_UPLOAD_BYTES + UPLOAD_ENVELOPE_BYTES);
  return new Response(new Uint8Array(bytes), { headers: { 'Content-Type': req.headers.get('content-type') ?? '' } }).formData().catch(() => {
    throw new AppError('validation_failed', `Send the ${what} as multipart/form-data`, { fields: { [field]: 'a file is required' } });
  });
}

/** JSON nested deeper than any of our bodies, with more keys than any needs, or with text that is not well-formed Unicode, is refused. */
export const JSON_MAX_DEPTH = 20;
export const JSON_MAX_KEYS = 20_000;

export function assertJsonShape(value: unknown): void {
  let keys = 0;
  const walk = (v: unknown, depth: number): void => {
    if (typeof v === 'string') return assertWellFormed(v);
    if (v === null || typeof v !== 'object') return;
    if (!Array.isArray(v)) for (const k of Object.keys(v)) assertWellFormed(k);
    if (depth > JSON_MAX_DEPTH) throw new AppError('bad_request', `The JSON body is nested more than ${JSON_MAX_DEPTH} levels deep`);
    const entries = Array.isArray(v) ? v : Object.values(v);
    keys += entries.length;
    if (keys > JSON_MAX_KEYS) throw new AppError('bad_request', `The JSON body has more than ${JSON_MAX_KEYS} values`);
    for (const e of entries) walk(e, depth + 1);
  };
  walk(value, 1);
}

function assertWellFormed(text: string): void {
  if (!isWellFormedText(text)) throw new AppError('bad_request', 'The body holds text that is not well-formed Unicode (half of a surrogate pair)');
}
