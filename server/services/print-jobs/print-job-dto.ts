import 'server-only';
import type { PrintJob } from '@/models';
import type { PrintJobDto } from '@/lib/contracts/labels';

export function toPrintJobDto(job: PrintJob): PrintJobDto {
  return {
    id: job.id,
    batchId: job.batchId,
    batchIndex: job.batchIndex,
    batchCount: job.batchCount,
    template: job.template,
    stock: job.stock,
    ids: JSON.parse(job.itemIds) as number[],
    labels: job.labels,
    printer: job.printerUrl,
    status: job.status,
    pages: job.pages,
    bytes: job.bytes,
    printerJobId: job.printerJobId,
    error: job.error,
    note: job.note,
    requestedBy: job.requestedBy,
    createdAt: job.createdAt.toISOString(),
    sentAt: job.sentAt?.toISOString() ?? null,
  };
}
