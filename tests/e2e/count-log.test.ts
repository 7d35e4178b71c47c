import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { followNav, gridRows, openBrowser, screenshot, signInThroughPage } from '../helpers/browser';
import { createPart, createScale } from '../helpers/db';
import { signedIn } from '../helpers/http';

describe('count log (browser)', () => {
  let desk: BrowserContext;
  let tablet: BrowserContext;
  beforeAll(async () => {
    desk = await openBrowser();
    tablet = await openBrowser({ width: 800, height: 1280 });
  });
  afterAll(async () => {
    await desk.close();
    await tablet.close();
  });

  it('a quality engineer finds a part’s captures, narrows them to the counts that were not exact, and downloads that view', async () => {
    // 40 pieces of 0.5 g count exactly from a sample of 20; 400 do not with a 2 % spread.
    const part = await createPart({ pieceSpread: 0.02 });
    const scale = await createScale({ divisionG: 0.01, eG: 0.1, repeatabilityG: 0.005 });
    const { agent } = await signedIn('operator');
    for (const pieces of [40, 400]) {
      const res = await agent
        .post('/api/v1/counts')
        .set('Idempotency-Key', randomUUID())
        .send({
          purpose: 'part',
          partId: part.id,
          scaleId: scale.id,
          unit: 'g',
          gross: pieces * 0.5,
          tare: 0,
          sample: { quantity: 20, netWeight: 10 },
          sampleOnPan: false,
          stable: true,
        });
      expect(res.status).toBe(201);
    }

    for (const [context, size] of [
      [desk, '1280x800'],
      [tablet, '800x1280'],
    ] as const) {
      const page = await context.newPage();
      await signInThroughPage(page, 'quality');
      await followNav(page, 'Count log');
      await page.waitForURL('**/counts');
      const filters = page.getByRole('search', { name: 'Filter the count log' });
      await filters.getByLabel('Part number').fill(part.partNumber.toLowerCase());
      await filters.getByRole('button', { name: 'Show' }).click();
      await expect.poll(() => page.getByTestId('log-summary').textContent()).toBe('1–2 of 2 counts.');
      // Rows of the grid at desk width, cards on the tablet.
      await expect.poll(() => gridRows(page, 'Count log', part.partNumber).count()).toBe(2);
      await screenshot(page, `count-log-${size}`);

      await filters.getByLabel('Only counts that were not exact').check();
      await filters.getByRole('button', { name: 'Show' }).click();
      await expect.poll(() => page.getByTestId('log-summary').textContent()).toBe('1–1 of 1 count.');
      const row = gridRows(page, 'Count log', part.partNumber);
      await expect.poll(() => row.textContent()).toContain('not exact');
      expect(await row.textContent()).toContain('400');
      expect(await page.getByRole('link', { name: 'Download CSV' }).getAttribute('href')).toBe(
        `/api/v1/counts/export?partNumber=${part.partNumber}&notExact=1`,
      );
      await page.close();
    }
  });
});
