import 'server-only';
import { randomUUID } from 'node:crypto';
import type { LabelTemplate } from '@/lib/domain/labels';
import type { StockId } from '@/labels/stocks';
import { PrintJob } from '@/models';
import { getDb } from '../../db';
import { printerUrlFor } from '../../print/printer-url';
import type { PrintJobDto } from '@/lib/contracts/labels';
import { loadLabelBatch } from '../labels/load-label-batch';
import { toPrintJobDto } from './print-job-dto';

// A printer takes a big batch better in pieces, and a jam then costs one piece, not the lot.
export const LABELS_PER_JOB = 100;

export interface QueuedBatch {
  batchId: string;
  jobs: PrintJobDto[];
}

// Checks every id up front (unknown → 404, nothing queued), then logs one queued job per 100 labels.
// sendPrintJobs sends them; GET /api/v1/print-jobs?batch=… shows the progress.
export async function queuePrintJobs({
  template,
  stock,
  ids,
  printer,
  by,
}: {
  template: LabelTemplate;
  stock: StockId;
  ids: number[];
  printer?: string;
  by: { id: number } | null;
}): Promise<QueuedBatch> {
  const db = getDb();
  await loadLabelBatch({ template, stock, ids });
  const batchId = randomUUID();
  const printerUrl = printerUrlFor(printer);
  const chunks = Array.from({ length: Math.ceil(ids.length / LABELS_PER_JOB) }, (_, i) => ids.slice(i * LABELS_PER_JOB, (i + 1) * LABELS_PER_JOB));
  const jobs = await db.transaction(async (transaction) => {
    const rows: PrintJob[] = [];
    for (const [batchIndex, chunk] of chunks.entries()) {
      rows.push(
        await PrintJob.create(
          {
            batchId,
            batchIndex,
            batchCount: chunks.length,
            template,
            stock,
            itemIds: JSON.stringify(chunk),
            labels: chunk.length,
            printerUrl,
            status: 'queued',
            pages: null,
            bytes: null,
            printerJobId: null,
            error: null,
            requestedBy: by?.id ?? null,
            sentAt: null,
          },
          { transaction },
        ),
      );
    }
    return rows;
  });
  return { batchId, jobs: jobs.map(toPrintJobDto) };
}
