import { execFileSync } from 'node:child_process';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { Part } from '../../models';
import { createPart, testDb, unique } from '../helpers/db';

const root = path.resolve(__dirname, '../..');
const run = (script: string, ...args: string[]) =>
  execFileSync('bash', [path.join(root, 'scripts', script), ...args], { env: { ...process.env, TF_PROFILE: 'test', TF_BACKUP_KEEP: '3' }, encoding: 'utf8' });

describe('backup and restore', () => {
  it('round-trips the database: a part added after the backup is gone, one from before is back', async () => {
    testDb();
    const kept = await createPart({ partNumber: unique('KEEP').toUpperCase() });
    const file = run('backup.sh').trim().split('\n').pop()!;
    expect(file).toMatch(/\.data\/backups\/test\/tallyforge-\d{8}T\d{6}Z\.tar\.gz$/);
    const later = await createPart({ partNumber: unique('LATER').toUpperCase() });
    await Part.update({ description: 'changed after the backup' }, { where: { id: kept.id } });
    run('restore.sh', file, '--force');
    expect(await Part.findByPk(later.id)).toBeNull();
    expect((await Part.findByPk(kept.id))!.description).toBe('Test part');
  });
});
