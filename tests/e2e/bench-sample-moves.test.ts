import type { BrowserContext } from 'playwright-core';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { CountEvent } from '../../models';
import { createPart, createScale, testDb } from '../helpers/db';
import { openBrowser, screenshot, signInThroughPage } from '../helpers/browser';
import { CAPTURE_WAIT_MS, headingShown, liveCount, openBench, panButton, putOn, waitSettled, whenSettled } from '../helpers/bench';

// Quiet simulated scales (s_r = 0.2 d) so each step settles within a second or two.
const benchScale = (name: string) => createScale({ name, repeatabilityG: 0.02 });

describe('the bench: a sample that moves on (browser, simulated scales)', () => {
  let browser: BrowserContext;
  beforeAll(async () => {
    browser = await openBrowser({ width: 800, height: 1280 });
  });
  afterEach(async () => {
    for (const page of browser.pages().slice(1)) await page.close();
  });
  afterAll(async () => {
    await browser.close();
  });

  it('moves a count to another scale after the sample, keeping the sample: the capture names both scales', async () => {
    const fine = await benchScale('Sample scale');
    const bulk = await benchScale('Bulk scale');
    const part = await createPart({ pieceSpread: 0.01 });
    const page = await browser.newPage();
    await signInThroughPage(page, 'operator');
    await openBench(page, fine.id);
    await page.getByLabel('Scan or type a part number').fill(part.partNumber);
    await page.getByLabel('Scan or type a part number').press('Enter');
    // Before the sample the scale is fixed to the count.
    await expect.poll(() => page.locator('#scale-pick').isDisabled()).toBe(true);
    await panButton(page, /Place container/);
    await waitSettled(page);
    await whenSettled(page, () => page.getByRole('button', { name: /Tare now/ }).click(), headingShown(page, /Count \d+ pieces onto the pan/));
    await page.getByLabel('Pieces in the sample').fill('10');
    await putOn(page, 10);
    await whenSettled(page, () => page.getByRole('button', { name: /Sample of 10 is on/ }).click(), headingShown(page, /Grow the sample/));

    await page.locator('#scale-pick').selectOption(String(bulk.id));
    await expect.poll(() => page.getByTestId('moved-note').textContent()).toContain('sample of 10 pieces');
    expect(await page.getByTestId('sample-scale').textContent()).toContain('Sample scale');
    await screenshot(page, 'bench-moved-to-bulk');
    await panButton(page, /Place container/);
    await waitSettled(page);
    await whenSettled(page, () => page.getByRole('button', { name: /Tare now/ }).click(), headingShown(page, 'Add pieces up to the target'));
    await putOn(page, 60);
    expect(await liveCount(page)).toBe(60);
    const result = page.getByTestId('capture-result');
    await whenSettled(
      page,
      () => page.getByRole('button', { name: /Capture this count/ }).click(),
      async () => (await result.count()) === 1,
      CAPTURE_WAIT_MS,
    );
    testDb();
    const [event] = await CountEvent.findAll({ where: { partId: part.id } });
    expect(event).toMatchObject({ scaleId: fine.id, bulkScaleId: bulk.id, count: 60, sampleQuantity: 10, sampleOnPan: false });
  });

  it('offers to keep the sample on Stop, and the next count of the part starts from it with the sample off the pan', async () => {
    const scale = await benchScale('Keeping scale');
    const part = await createPart({ pieceSpread: 0.01 });
    const page = await browser.newPage();
    await signInThroughPage(page, 'operator');
    await openBench(page, scale.id, 11);
    const choose = async () => {
      await page.getByLabel('Scan or type a part number').fill(part.partNumber);
      await page.getByLabel('Scan or type a part number').press('Enter');
      await expect.poll(headingShown(page, 'Put the empty container on the pan')).toBe(true);
    };
    await choose();
    await panButton(page, /Place container/);
    await waitSettled(page);
    await whenSettled(page, () => page.getByRole('button', { name: /Tare now/ }).click(), headingShown(page, /Count \d+ pieces onto the pan/));
    await page.getByLabel('Pieces in the sample').fill('20');
    await putOn(page, 20);
    await whenSettled(page, () => page.getByRole('button', { name: /Sample of 20 is on/ }).click(), headingShown(page, /Grow the sample/));

    await page.getByRole('button', { name: 'Stop this count and choose other work' }).click();
    const ask = page.getByRole('alertdialog', { name: 'Please confirm' });
    await screenshot(page, 'bench-stop-keep');
    await ask.getByRole('button', { name: 'Stop, keep the sample of 20 pieces' }).click();
    await expect.poll(() => page.getByTestId('notice').textContent()).toContain('is kept');

    await panButton(page, /Empty the pan/);
    await choose();
    await page.getByTestId('kept-sample').getByRole('button', { name: 'Use the kept sample' }).click();
    await expect.poll(() => page.getByTestId('kept-in-use').isVisible()).toBe(true);
    await panButton(page, /Place container/);
    await waitSettled(page);
    await whenSettled(page, () => page.getByRole('button', { name: /Tare now/ }).click(), headingShown(page, 'Add pieces up to the target'));
    await putOn(page, 50);
    expect(await liveCount(page)).toBe(50);
    const result = page.getByTestId('capture-result');
    await whenSettled(
      page,
      () => page.getByRole('button', { name: /Capture this count/ }).click(),
      async () => (await result.count()) === 1,
      CAPTURE_WAIT_MS,
    );
    testDb();
    const [event] = await CountEvent.findAll({ where: { partId: part.id } });
    expect(event).toMatchObject({ scaleId: scale.id, bulkScaleId: null, count: 50, sampleQuantity: 20, sampleOnPan: false });
  });
});
