import 'server-only';
import { Op } from 'sequelize';
import type { LabelTemplate } from '@/lib/domain/labels';
import type { StockId } from '@/labels/stocks';
import { describeUnprintable } from '@/lib/unprintable';
import { PrintJob, User } from '@/models';
import { getDb } from '../../db';
import { log } from '../../log';
import { sendToPrinter } from '../../print/send-to-printer';
import type { PrintJobDto } from '@/lib/contracts/labels';
import { renderLabelPdf } from '../labels/render-label-pdf';
import { toPrintJobDto } from './print-job-dto';

// Renders and sends queued jobs one after another. A failure is written on its job row and the next
// job still goes: nothing here throws for a printer that is off or a label that cannot be made.
export async function sendPrintJobs({ jobIds }: { jobIds: number[] }): Promise<PrintJobDto[]> {
  getDb();
  const jobs = await PrintJob.findAll({ where: { id: { [Op.in]: jobIds }, status: 'queued' }, order: [['id', 'ASC']] });
  for (const job of jobs) {
    try {
      const { pdf, pages, filename, unprintable } = await renderLabelPdf({
        template: job.template as LabelTemplate,
        stock: job.stock as StockId,
        ids: JSON.parse(job.itemIds) as number[],
      });
      await job.update({ pages, bytes: pdf.length, note: unprintable.length ? describeUnprintable(unprintable).slice(0, 500) : null });
      const user = job.requestedBy ? await User.findByPk(job.requestedBy) : null;
      const jobName = job.batchCount > 1 ? `${filename} (${job.batchIndex + 1} of ${job.batchCount})` : filename;
      const sent = await sendToPrinter({ printerUrl: job.printerUrl, pdf, jobName, userName: user?.email ?? 'tallyforge' });
      await job.update({ status: 'sent', printerJobId: sent.printerJobId, sentAt: new Date() });
    } catch (err) {
      const message = err instanceof Error ? err.message : String(err);
      await job.update({ status: 'failed', error: message.slice(0, 500) });
      log.error({ printJobId: job.id, err }, 'print job failed');
    }
  }
  const done = await PrintJob.findAll({ where: { id: { [Op.in]: jobIds } }, order: [['id', 'ASC']] });
  return done.map(toPrintJobDto);
}
