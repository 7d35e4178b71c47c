import { randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import type { BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { decodePdf } from '../helpers/decode-pdf';
import { openBrowser, screenshot, signInThroughPage } from '../helpers/browser';
import { PrintJob } from '../../models';
import { createPart, stockPart, testDb } from '../helpers/db';
import { printedJobs } from '../helpers/printer';

describe('labels (browser)', () => {
  let desk: BrowserContext;
  beforeAll(async () => {
    desk = await openBrowser();
  });
  afterAll(async () => {
    await desk.close();
  });

  it('a clerk ticks a bin, downloads its label PDF, sends it to the printer and watches the print log reach sent', async () => {
    const part = await createPart();
    const bin = await stockPart(part.id, 40);
    // Older jobs already in the log, as in any shop: the new one must be found among them.
    testDb();
    for (const labels of [3, 7])
      await PrintJob.create({
        batchId: randomUUID(),
        batchIndex: 0,
        batchCount: 1,
        template: 'part',
        stock: '2x1in',
        itemIds: '[1]',
        labels,
        printerUrl: 'ipp://127.0.0.1:1/printers/labels',
        status: 'sent',
        requestedBy: null,
      });
    const page = await desk.newPage();
    await signInThroughPage(page, 'clerk');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Labels' }).click();
    await page.waitForURL('**/labels');

    await page.getByLabel('Find').fill(bin.code);
    await page
      .getByRole('region', { name: 'Bins to label' })
      .getByRole('row', { name: new RegExp(bin.code) })
      .getByRole('checkbox')
      .check();
    await expect.poll(() => page.getByTestId('label-status').textContent()).toBe('1 bin label chosen.');
    await page.getByLabel('Label stock').selectOption('2x1in');

    const download = page.waitForEvent('download');
    await page.getByRole('button', { name: 'Download PDF' }).click();
    const pdf = readFileSync((await (await download).path())!);
    const [symbols] = await decodePdf(pdf);
    expect(symbols.map((s) => s.text)).toContain(bin.code);

    const before = printedJobs().length;
    await page.getByRole('button', { name: 'Send to printer' }).click();
    await expect.poll(() => page.getByTestId('label-status').textContent()).toMatch(/^1 bin label queued for the printer as job \d+\.$/);
    const jobId = /job (\d+)/.exec((await page.getByTestId('label-status').textContent())!)![1];
    const row = page
      .getByRole('region', { name: 'Print log' })
      .getByRole('row')
      .filter({ has: page.getByRole('gridcell', { name: jobId, exact: true }) });
    await expect.poll(() => row.textContent(), { timeout: 20_000 }).toMatch(/1 bin.*2x1in.*Sent/);
    await expect.poll(() => printedJobs().length).toBe(before + 1);
    const [printed] = await decodePdf(printedJobs().at(-1)!.pdf);
    expect(printed.map((s) => s.text)).toContain(bin.code);
    await screenshot(page, 'labels-desk');

    // Kit labels need the room of 4 in wide stock: the narrow ones are not offered.
    await page.getByText('Kit labels', { exact: true }).click();
    expect(await page.getByLabel('Label stock').locator('option').allTextContents()).toEqual(expect.arrayContaining([expect.stringMatching(/^4 × /)]));
    expect((await page.getByLabel('Label stock').locator('option').allTextContents()).every((t) => t.startsWith('4 × '))).toBe(true);
  });
});
