import { randomUUID } from 'node:crypto';
import bwipjs from 'bwip-js/node';
import type { BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Kit } from '../../models';
import { gridRows, openBrowser, screenshot, signInThroughPage } from '../helpers/browser';
import { createPart, createScale, stockPart, testDb, unique } from '../helpers/db';
import { signedIn } from '../helpers/http';

describe('planner (browser)', () => {
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

  it('imports a bill of material, releases an order against stock, watches bench captures arrive and completes it', async () => {
    // Pins of 0.25 g with a tight spread, so one capture of a whole line is exact.
    const pin = await createPart({ pieceSpread: 0.001 });
    const sleeve = await createPart({ pieceSpread: 0.001 });
    await stockPart(pin.id, 1000);
    await stockPart(sleeve.id, 1000);
    const code = unique('KIT').toUpperCase();
    const page = await desk.newPage();
    await signInThroughPage(page, 'planner');

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Kits' }).click();
    await page.waitForURL('**/kits');
    const header = 'kit_code,revision,description,part_number,quantity,tolerance_below,tolerance_above';
    await page.getByLabel('CSV text').fill(`${header}\n${code},A,Linear guide kit,${pin.partNumber},20,0,1\n${code},A,,${sleeve.partNumber},10,,\n`);
    await page.getByRole('button', { name: 'Check file' }).click();
    await expect.poll(() => page.getByTestId('-api-v1-kits-import-status').textContent()).toContain('All 2 rows are good');
    await screenshot(page, 'kits-import-preview');
    await page.getByRole('button', { name: 'Import all 2 rows' }).click();
    await expect.poll(() => page.getByTestId('kits-notice').textContent()).toContain('2 bill-of-material lines imported');
    // The grid draws only the rows in view; with the suite's many kits the new one is found by filtering.
    await page.getByLabel('Find kits').fill(code);
    await expect.poll(() => page.getByRole('link', { name: code }).count()).toBe(1);
    await screenshot(page, 'kits-list');
    testDb();
    const kit = (await Kit.findOne({ where: { code, revision: 'A' } }))!;

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Build orders' }).click();
    await page.waitForURL('**/orders');
    const form = page.getByRole('form', { name: 'New build order' });
    await form.getByRole('button', { name: 'Create draft' }).click();
    await expect.poll(() => form.getByText('Pick a kit revision').isVisible()).toBe(true);
    await form.getByLabel('Kit revision').selectOption(String(kit.id));
    await form.getByLabel('Number of kits').fill('5');
    await form.getByLabel('Due date').fill('2026-12-20');
    await form.getByRole('button', { name: 'Create draft' }).click();
    await page.waitForURL(/\/orders\/\d+$/);
    const orderId = Number(new URL(page.url()).pathname.split('/').pop());
    await expect.poll(() => page.getByTestId('availability-summary').textContent()).toContain('Every part is in stock');
    expect(await page.getByTestId(`line-${pin.partNumber}`).textContent()).toContain('Open');
    await screenshot(page, 'order-draft');
    await page.getByRole('button', { name: 'Release to the bench' }).click();
    await expect.poll(() => page.getByTestId('order-status').textContent()).toBe('Released');
    await expect.poll(() => page.getByTestId('order-progress').textContent()).toContain('0 / 2');

    // An operator captures both lines at the bench; the planner's open page follows without a reload.
    const operator = await signedIn('operator');
    const scale = await createScale({ divisionG: 0.01, eG: 0.1, capacityG: 600, repeatabilityG: 0 });
    const order = (await operator.agent.get(`/api/v1/orders/${orderId}`)).body.order;
    const lineOf = (partId: number) => order.lines.find((l: { partId: number }) => l.partId === partId);
    const capture = (partId: number, pieces: number) =>
      operator.agent
        .post('/api/v1/counts')
        .set('Idempotency-Key', randomUUID())
        .send({
          purpose: 'kit_line',
          orderLineId: lineOf(partId).id,
          partId,
          scaleId: scale.id,
          gross: pieces * 0.25,
          tare: 0,
          sample: { quantity: 20, netWeight: 5 },
          sampleOnPan: true,
          targetQuantity: pieces,
          stable: true,
        });
    expect((await capture(pin.id, 100)).status).toBe(201);
    await expect.poll(() => page.getByTestId('order-progress').textContent(), { timeout: 15_000 }).toContain('1 / 2');
    expect(await page.getByTestId('order-status').textContent()).toBe('Being kitted');
    expect(await page.getByTestId(`line-${pin.partNumber}`).textContent()).toContain('In tolerance');
    await screenshot(page, 'order-in-progress');
    const view = await tablet.newPage();
    await signInThroughPage(view, 'planner');
    await view.goto(`/orders/${orderId}`);
    await screenshot(view, 'order-in-progress-tablet');

    expect((await capture(sleeve.id, 50)).status).toBe(201);
    await expect.poll(() => page.getByTestId('order-progress').textContent(), { timeout: 15_000 }).toContain('2 / 2');
    await expect.poll(() => page.getByText('Every line is in tolerance.').isVisible()).toBe(true);
    await view.goto('/');
    await expect.poll(() => view.getByTestId('waiting-orders-ready').isVisible()).toBe(true);
    await screenshot(view, 'today-planner-tablet');

    await page.getByRole('button', { name: 'Complete the order' }).click();
    await expect.poll(() => page.getByTestId('order-status').textContent()).toBe('Complete');
    await screenshot(page, 'order-complete');
    await page.goto('/orders');
    // Found by the start of its number from the page's own search, one row of one.
    await page.getByLabel('Find orders').fill(order.number);
    await page.getByRole('button', { name: 'Search' }).click();
    await expect.poll(() => page.getByTestId('orders-summary').textContent()).toBe(`1–1 of 1 order starting “${order.number}”.`);
    await expect.poll(() => page.getByRole('link', { name: order.number }).count()).toBe(1);
    await screenshot(page, 'orders-list');
  });

  it('shows the parts master with learned and assumed spread, and its CSV download, on a desk and a tablet', async () => {
    const tag = unique('PM').toUpperCase();
    await createPart({ partNumber: `${tag}-LEARNED`, pieceSpread: 0.012 });
    await createPart({ partNumber: `${tag}-NEW` });
    const page = await tablet.newPage();
    await signInThroughPage(page, 'clerk');
    await page.goto(`/parts?q=${tag}`);
    await expect.poll(() => page.getByTestId('parts-notice').textContent()).toContain(`2 parts matching “${tag}”`);
    // A card per part on the tablet, with the same columns as the desk's grid.
    expect(await gridRows(page, 'Parts', `${tag}-NEW`).textContent()).toContain('assumed');
    expect(await gridRows(page, 'Parts', `${tag}-LEARNED`).textContent()).toContain('1.2 %');
    expect(await page.getByRole('link', { name: 'Download CSV' }).getAttribute('href')).toBe(`/api/v1/parts/export?q=${tag}`);
    await screenshot(page, 'parts-tablet');
  });

  it('a planner adds a part photo from the edit form; a file that only claims to be a picture is refused with the reason', async () => {
    const part = await createPart();
    // A real, decodable PNG: a QR symbol of the part number.
    const png = await bwipjs.toBuffer({ bcid: 'qrcode', text: part.partNumber, scale: 4 });
    const page = await desk.newPage();
    await signInThroughPage(page, 'planner');
    await page.goto(`/parts?q=${part.partNumber}`);
    await page.getByRole('button', { name: `Edit ${part.partNumber}` }).click();
    const form = page.getByRole('form', { name: `Edit ${part.partNumber}` });
    await expect.poll(() => form.getByTestId('part-photo').textContent()).toContain('No photo');

    await form.getByLabel('Add a photo').setInputFiles({ name: 'label.png', mimeType: 'image/png', buffer: Buffer.from('<svg onload=alert(1)>') });
    await expect.poll(() => form.getByTestId('part-photo').textContent()).toContain('must be JPEG, PNG, WEBP');

    await form.getByLabel('Add a photo').setInputFiles({ name: 'qr.png', mimeType: 'image/png', buffer: png });
    await expect.poll(() => form.getByTestId('part-photo').textContent()).toContain('Photo saved');
    const img = form.getByRole('img', { name: `Photo of ${part.partNumber}` });
    await expect.poll(() => img.evaluate((el: HTMLImageElement) => el.complete && el.naturalWidth)).toBeGreaterThan(0);
    await expect
      .poll(() =>
        page
          .getByRole('row', { name: new RegExp(part.partNumber) })
          .getByRole('img')
          .count(),
      )
      .toBe(1);

    // The photo bumped the part's version; the form took the new one, so saving still works.
    await form.getByLabel('Description').fill('Pin with a photo');
    await form.getByRole('button', { name: 'Save part' }).click();
    await expect.poll(() => page.getByTestId('parts-notice').textContent()).toContain(`${part.partNumber} saved`);
    await screenshot(page, 'part-photo');
  });

  it('creates a kit in the form by part number, copies it to a new revision and retires the old one', async () => {
    const washer = await createPart();
    const code = unique('KIT').toUpperCase();
    const page = await desk.newPage();
    await signInThroughPage(page, 'planner');
    await page.goto('/kits');
    await page.getByRole('button', { name: 'New kit' }).click();
    const form = page.getByRole('form', { name: 'New kit' });
    await form.getByRole('button', { name: 'Create kit' }).click();
    await expect.poll(() => form.getByText('Type a part number that exists').isVisible()).toBe(true);
    await form.getByLabel('Kit code').fill(code);
    await form.getByLabel('Description', { exact: true }).fill('Washer pack');
    await form.getByLabel('Part number (line 1)').fill(washer.partNumber.toLowerCase());
    await expect.poll(() => form.getByTestId('component-0').textContent()).toContain('Test part');
    await form.getByLabel('Qty per kit (line 1)').fill('12');
    await form.getByLabel('Above (+) (line 1)').fill('1');
    await screenshot(page, 'kit-create-form');
    await form.getByRole('button', { name: 'Create kit' }).click();
    await page.waitForURL(/\/kits\/\d+$/);
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toContain(code);
    const firstUrl = page.url();

    await page.getByLabel('New revision', { exact: true }).fill('b');
    await page.getByRole('button', { name: 'Copy to new revision' }).click();
    await page.waitForURL((url) => url.href !== firstUrl && /\/kits\/\d+$/.test(url.pathname));
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toContain('rev B');
    expect(await page.getByLabel('Qty per kit (line 1)').inputValue()).toBe('12');
    await page.goto(firstUrl);
    await page.getByRole('button', { name: 'Retire revision A' }).click();
    await expect.poll(() => page.getByRole('button', { name: 'Bring revision A back into use' }).isVisible()).toBe(true);
    await screenshot(page, 'kit-retired');
    const view = await tablet.newPage();
    await signInThroughPage(view, 'planner');
    await view.goto(firstUrl);
    await screenshot(view, 'kit-page-tablet');
  });
});
