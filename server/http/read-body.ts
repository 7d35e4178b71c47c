import 'server-only';
import { AppError } from '../errors';
import { isWellFormedText } from '@/lib/well-formed-text';

// Request bodies are read against a limit before anything is parsed: a declared length over it is
// refused at once (413) without reading; a body without one is read until it passes the limit.
export const JSON_BODY_LIMIT = 256 * 1024;
/** Sign-in and set-password bodies: an e-mail, a password and a token. */
export const CREDENTIALS_BODY_LIMIT = 8 * 1024;
/** A multipart upload: the file (MAX_UPLOAD_BYTES) and its envelope. */
export const UPLOAD_ENVELOPE_BYTES = 64 * 1024;

const tooLarge = (limit: number) =>
  new AppError('payload_too_large', `The request body is larger than this address takes (${Math.round(limit / 1024)} KB)`);

export function assertDeclaredSize(req: Request, limit: number): void {
  const declared = req.headers.get('content-length');
  if (declared !== null && Number(declared) > limit) throw tooLarge(limit);
}

export async function readBodyText(req: Request, limit: number): Promise<string> {
  assertDeclaredSize(req, limit);
  if (!req.body) return '';
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > limit) {
      await reader.cancel();
      throw tooLarge(limit);
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks).toString('utf8');
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
