import 'server-only';
import { Part } from '@/models';
import { CONTENT_TYPES, type FileKind } from '@/lib/file-kind';
import { getDb } from '../../db';
import { notFound } from '../../errors';
import type { PartDto } from '../../schemas/parts';
import { readUpload, storeUpload } from '../../uploads/store-upload';
import { toPartDto } from './part-dto';

const PHOTO_KINDS: FileKind[] = ['jpeg', 'png', 'webp'];

export async function savePartPhoto({ partId, file }: { partId: number; file: unknown }): Promise<PartDto> {
  getDb();
  const part = await Part.findByPk(partId);
  if (!part) throw notFound('Part');
  const { name } = await storeUpload(file, PHOTO_KINDS, 'photo');
  part.photoFile = name;
  await part.save();
  return toPartDto(part);
}

export async function readPartPhoto({ partId }: { partId: number }): Promise<{ bytes: Buffer; contentType: string }> {
  getDb();
  const part = await Part.findByPk(partId, { attributes: ['id', 'photoFile'] });
  if (!part?.photoFile) throw notFound('Photo');
  const ext = part.photoFile.split('.').pop()!;
  return { bytes: await readUpload(part.photoFile), contentType: CONTENT_TYPES[(ext === 'jpg' ? 'jpeg' : ext) as FileKind] };
}
