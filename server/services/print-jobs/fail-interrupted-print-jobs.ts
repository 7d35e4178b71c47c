import 'server-only';
import { Op } from 'sequelize';
import { PrintJob } from '@/models';
import { getDb } from '../../db';

// Jobs are sent right after the request that queued them; a job still queued this long after was
// left behind by an app that stopped. A whole 5 000-label request takes well under a minute here.
export const INTERRUPTED_AFTER_MS = 10 * 60_000;
export const INTERRUPTED_MESSAGE = 'Interrupted before it reached the printer (the app stopped); print it again if no labels came out';

// Marks such jobs failed, so the print log says so and offers to print them again. A send that was
// only slow still ends as sent: sending writes its own status last.
export async function failInterruptedPrintJobs(now = new Date()): Promise<number> {
  getDb();
  const [count] = await PrintJob.update(
    { status: 'failed', error: INTERRUPTED_MESSAGE },
    { where: { status: 'queued', createdAt: { [Op.lt]: new Date(now.getTime() - INTERRUPTED_AFTER_MS) } } },
  );
  return count;
}
