import { describe, expect, it } from 'vitest';
import { PDFDocument } from 'pdf-lib';
import { Part, PrintJob } from '../../models';
import { failInterruptedPrintJobs, INTERRUPTED_MESSAGE } from '../../server/services/print-jobs/fail-interrupted-print-jobs';
import { printKitLabel } from '../../server/services/print-jobs/print-kit-label';
import { decodePdf, isPdf } from '../helpers/decode-pdf';
import { createPart, stockPart, testDb } from '../helpers/db';
import { signedIn } from '../helpers/http';
import { releasedOrder } from '../helpers/orders';
import { printedJob, sendToProjectPrinter, waitForBatch } from '../helpers/printer';

sendToProjectPrinter();

describe('print jobs over IPP', () => {
  it('queues, renders and sends a PDF to the printer, and logs it as sent', async () => {
    const { agent, email } = await signedIn('clerk');
    const bins = [await stockPart((await createPart()).id, 1), await stockPart((await createPart()).id, 1)];
    const res = await agent.post('/api/v1/print-jobs').send({ template: 'bin', stock: '4x2in', ids: bins.map((b) => b.id) });
    expect(res.status).toBe(202);
    expect(res.body.jobs).toEqual([expect.objectContaining({ status: 'queued', labels: 2, batchCount: 1 })]);
    const [job] = await waitForBatch(agent, res.body.batchId);
    expect(job).toMatchObject({
      status: 'sent',
      pages: 2,
      error: null,
      note: null,
      printer: expect.stringMatching(/^ipp:\/\/127\.0\.0\.1:\d+\/printers\/labels$/),
    });
    const received = printedJob(job.printerJobId as number)!;
    expect(received).toMatchObject({
      queue: 'labels',
      documentFormat: 'application/pdf',
      userName: email,
      bytes: job.bytes,
      jobName: 'bin-2-labels-4x2in.pdf',
    });
    expect(isPdf(received.pdf)).toBe(true);
    const pages = await decodePdf(received.pdf);
    expect(pages.map((p) => p.find((s) => s.format === 'Code128')?.text)).toEqual(bins.map((b) => b.code));
  });

  it('prints a character the label fonts lack as "?" and says so, on the PDF answer and in the print log', async () => {
    const { agent } = await signedIn('clerk');
    const part = await createPart();
    testDb();
    await Part.update({ description: '漢字 bracket, zinc' }, { where: { id: part.id } });
    const bin = await stockPart(part.id, 1);
    const pdf = await agent.post('/api/v1/labels').send({ template: 'bin', stock: '4x2in', ids: [bin.id] });
    expect(pdf.status).toBe(200);
    expect(pdf.headers['x-unprintable-characters']).toBe('U+6F22 U+5B57');
    const res = await agent.post('/api/v1/print-jobs').send({ template: 'bin', stock: '4x2in', ids: [bin.id] });
    const [job] = await waitForBatch(agent, res.body.batchId);
    expect(job.status).toBe('sent');
    expect(job.note).toMatch(/^Printed as "\?": 漢 \(U\+6F22\), 字 \(U\+5B57\)/);
  });

  it('splits a big print into jobs of 100 labels and reports each', async () => {
    const { agent } = await signedIn('planner');
    const bin = await stockPart((await createPart()).id, 1);
    const res = await agent.post('/api/v1/print-jobs').send({ template: 'bin', stock: 'letter-30up', ids: Array(250).fill(bin.id) });
    expect(res.status).toBe(202);
    expect(res.body.jobs.map((j: { labels: number; batchIndex: number }) => [j.batchIndex, j.labels])).toEqual([
      [0, 100],
      [1, 100],
      [2, 50],
    ]);
    const jobs = await waitForBatch(agent, res.body.batchId);
    expect(jobs.map((j) => [j.status, j.pages])).toEqual([
      ['sent', 4],
      ['sent', 4],
      ['sent', 2],
    ]);
    for (const job of jobs) {
      const received = printedJob(job.printerJobId as number)!;
      expect((await PDFDocument.load(received.pdf)).getPageCount()).toBe(job.pages);
      expect(received.jobName).toMatch(new RegExp(`\\(${(job.batchIndex as number) + 1} of 3\\)$`));
    }
  });

  it('records a job the printer refuses as failed, with its error, and lists it', async () => {
    const { agent } = await signedIn('admin');
    const bin = await stockPart((await createPart()).id, 1);
    const res = await agent.post('/api/v1/print-jobs').send({ template: 'bin', stock: '2x1in', ids: [bin.id], printer: 'nowhere' });
    const [job] = await waitForBatch(agent, res.body.batchId);
    expect(job).toMatchObject({
      status: 'failed',
      printerJobId: null,
      error: expect.stringContaining('client-error-not-found'),
      printer: expect.stringMatching(/\/printers\/nowhere$/),
    });
    const list = await agent.get('/api/v1/print-jobs');
    expect(list.status).toBe(200);
    expect(list.body.jobs.find((j: { id: number }) => j.id === job.id)).toMatchObject({ status: 'failed' });
  });

  it('refuses bad input with 400 per field and queues nothing', async () => {
    const { agent } = await signedIn('clerk');
    testDb();
    const before = await PrintJob.count();
    const bad = await agent.post('/api/v1/print-jobs').send({ template: 'bin', stock: '4x2in', ids: [1], printer: 'http://elsewhere/' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.printer).toMatch(/queue name/);
    const unknown = await agent.post('/api/v1/print-jobs').send({ template: 'bin', stock: '4x2in', ids: [99999999] });
    expect(unknown.status).toBe(404);
    expect((await agent.get('/api/v1/print-jobs?batch=nope')).status).toBe(400);
    expect(await PrintJob.count()).toBe(before);
  });
});

describe('print jobs an app left behind when it stopped', () => {
  it('marks jobs still queued after 10 minutes as failed, saying why, and leaves newer ones alone', async () => {
    testDb();
    const job = (minutesAgo: number) => {
      const at = new Date(Date.now() - minutesAgo * 60_000);
      return PrintJob.create({
        batchId: crypto.randomUUID(),
        batchIndex: 0,
        batchCount: 1,
        template: 'bin',
        stock: '2x1in',
        itemIds: '[1]',
        labels: 1,
        printerUrl: 'ipp://127.0.0.1:1/printers/x',
        status: 'queued',
        requestedBy: null,
        createdAt: at,
        updatedAt: at,
      });
    };
    const stranded = await job(11);
    const fresh = await job(2);
    expect(await failInterruptedPrintJobs()).toBeGreaterThanOrEqual(1);
    expect(await PrintJob.findByPk(stranded.id)).toMatchObject({ status: 'failed', error: INTERRUPTED_MESSAGE });
    expect(await PrintJob.findByPk(fresh.id)).toMatchObject({ status: 'queued', error: null });
    await fresh.destroy();
  });
});

describe('printKitLabel (called by the server when an order completes)', () => {
  it('sends the kit label of the order to the printer and returns the logged job', async () => {
    const { agent } = await signedIn('planner');
    const { kit, order } = await releasedOrder(agent, { quantity: 3 });
    const job = await printKitLabel({ orderId: order.id });
    expect(job).toMatchObject({ status: 'sent', template: 'kit', stock: '4x6in', ids: [order.id], requestedBy: null, pages: 1 });
    const received = printedJob(job.printerJobId!)!;
    expect(received.jobName).toBe(`kit-${order.number}-4x6in.pdf`);
    const [page] = await decodePdf(received.pdf);
    expect(page.find((s) => s.format === 'DataMatrix')?.text).toBe(`(91)${kit.code}:C(92)${order.number}(93)3`);
  });

  it('records a printer failure on the job instead of throwing', async () => {
    const { agent } = await signedIn('planner');
    const { order } = await releasedOrder(agent);
    const job = await printKitLabel({ orderId: order.id, printer: 'switched-off' });
    expect(job.status).toBe('failed');
    testDb();
    expect((await PrintJob.findByPk(job.id))!.error).toContain('client-error-not-found');
  });
});
