import 'server-only';
import type { StockId } from '@/labels/stocks';
import type { PrintJobDto } from '@/lib/contracts/labels';
import { queuePrintJobs } from './queue-print-jobs';
import { sendPrintJobs } from './send-print-jobs';

// The kit label of a build order, sent by the server itself (operators need no print permission).
// Call after the completion commits: a printer failure is recorded on the returned job, never thrown;
// it throws only when the order does not exist or is not released or complete.
export async function printKitLabel({ orderId, stock = '4x6in', printer }: { orderId: number; stock?: StockId; printer?: string }): Promise<PrintJobDto> {
  const { jobs } = await queuePrintJobs({ template: 'kit', stock, ids: [orderId], printer, by: null });
  const [job] = await sendPrintJobs({ jobIds: jobs.map((j) => j.id) });
  return job;
}
