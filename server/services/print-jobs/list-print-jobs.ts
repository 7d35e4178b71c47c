import 'server-only';
import { PrintJob } from '@/models';
import { getDb } from '../../db';
import type { PrintJobDto } from '@/lib/contracts/labels';
import { toPrintJobDto } from './print-job-dto';

// The print log, newest first; one batch in order when asked for (the progress of a big print).
export async function listPrintJobs({ batch, limit }: { batch?: string; limit: number }): Promise<PrintJobDto[]> {
  getDb();
  const rows = batch
    ? await PrintJob.findAll({ where: { batchId: batch }, order: [['batchIndex', 'ASC']] })
    : await PrintJob.findAll({ order: [['id', 'DESC']], limit });
  return rows.map(toPrintJobDto);
}
