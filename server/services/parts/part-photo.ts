import 'server-only';
import { Part } from '@/models';
import { CONTENT_TYPES, type FileKind } from '@/lib/file-kind';
import { getDb } from '../../db';
import { notFound } from '../../errors';
import type { PartDto } from '@/lib/contracts/parts';
import { readUpload, removeUpload, storeAttachedUpload } from '../../uploads/store-upload';
import { toPartDto } from './part-dto';

const PHOTO_KINDS: FileKind[] = ['jpeg', 'png', 'webp'];

// The part's row is locked while its photo changes, so of two uploads at once the second sees the
// first's file as the one it replaces; a replaced photo is removed once the change has committed.
export async function savePartPhoto({ partId, file }: { partId: number; file: unknown }): Promise<PartDto> {
  const { part, replaced } = await storeAttachedUpload(file, PHOTO_KINDS, 'photo', (name) =>
    getDb().transaction(async (transaction) => {
      const found = await Part.findByPk(partId, { transaction, lock: transaction.LOCK.UPDATE });
      if (!found) throw notFound('Part');
      const previous = found.photoFile;
      found.photoFile = name;
      await found.save({ transaction });
      return { part: found, replaced: previous };
    }),
  );
  if (replaced) await removeUpload(replaced);
  return toPartDto(part);
}

export async function readPartPhoto({ partId }: { partId: number }): Promise<{ bytes: Buffer; contentType: string }> {
  getDb();
  const part = await Part.findByPk(partId, { attributes: ['id', 'photoFile'] });
  if (!part?.photoFile) throw notFound('Photo');
  const ext = part.photoFile.split('.').pop()!;
  return { bytes: await readUpload(part.photoFile), contentType: CONTENT_TYPES[(ext === 'jpg' ? 'jpeg' : ext) as FileKind] };
}
