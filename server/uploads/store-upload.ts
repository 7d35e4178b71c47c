import 'server-only';
import { randomUUID } from 'node:crypto';
import { mkdir, readFile, rename, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { detectFileKind, MAX_UPLOAD_BYTES, type FileKind } from '@/lib/file-kind';
import { getEnv } from '../env';
import { AppError } from '../errors';

function uploadDir(): string {
  return path.resolve(getEnv().UPLOAD_DIR);
}

// Checks size and kind by content, then stores under a generated name (never the uploader's), written
// to a temporary file first so a half-written upload is never served.
export async function storeUpload(file: unknown, allowed: readonly FileKind[], field = 'file'): Promise<{ name: string; kind: FileKind }> {
  if (!(file instanceof Blob)) throw new AppError('validation_failed', 'Attach a file', { fields: { [field]: 'a file is required' } });
  if (file.size > MAX_UPLOAD_BYTES)
    throw new AppError('validation_failed', 'The file is too large', { fields: { [field]: `at most ${MAX_UPLOAD_BYTES / 1024 / 1024} MB` } });
  const bytes = new Uint8Array(await file.arrayBuffer());
  const kind = detectFileKind(bytes);
  if (!kind || !allowed.includes(kind))
    throw new AppError('validation_failed', 'That kind of file is not accepted here', { fields: { [field]: `must be ${allowed.join(', ').toUpperCase()}` } });
  const dir = uploadDir();
  await mkdir(dir, { recursive: true });
  const name = `${randomUUID()}.${kind === 'jpeg' ? 'jpg' : kind}`;
  const temp = path.join(dir, `.${name}.part`);
  await writeFile(temp, bytes);
  await rename(temp, path.join(dir, name));
  return { name, kind };
}

// Stores the file, then runs `attach` to point a record at it. If attaching fails (record gone, database
// away) the stored file is removed again, so no file is left that nothing refers to.
export async function storeAttachedUpload<T>(file: unknown, allowed: readonly FileKind[], field: string, attach: (name: string) => Promise<T>): Promise<T> {
  const { name } = await storeUpload(file, allowed, field);
  try {
    return await attach(name);
  } catch (err) {
    await removeUpload(name);
    throw err;
  }
}

// Stored names are ours (uuid.ext); anything else never reaches the file system.
function storedPath(name: string): string {
  if (!/^[0-9a-f-]{36}\.(jpg|png|webp|pdf)$/.test(name)) throw new AppError('not_found', 'File was not found');
  return path.join(uploadDir(), name);
}

export async function readUpload(name: string): Promise<Buffer> {
  return readFile(storedPath(name));
}

export async function removeUpload(name: string): Promise<void> {
  await rm(storedPath(name), { force: true });
}
