import 'server-only';
import { UniqueConstraintError } from 'sequelize';
import { JobRun } from '@/models';
import { getDb } from '../db';

// Claims one unit of scheduled work. Every app instance may try; the primary key lets one win,
// so a reminder goes out once however many instances run the job.
export async function claimRun(job: string, runKey: string): Promise<boolean> {
  getDb();
  try {
    await JobRun.create({ job, runKey });
    return true;
  } catch (err) {
    if (err instanceof UniqueConstraintError) return false;
    throw err;
  }
}
