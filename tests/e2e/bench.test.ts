import type { BrowserContext } from 'playwright-core';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { BinCount, BuildOrderLine, Container, CountEvent, Scale } from '../../models';
import { createPart, createScale, stockPart, testDb, unique } from '../helpers/db';
import { signedIn } from '../helpers/http';
import { openBrowser, screenshot, signInThroughPage } from '../helpers/browser';
import { CAPTURE_WAIT_MS, headingShown, liveCount, openBench, panButton, putOn, waitSettled, wedgeScan, whenSettled } from '../helpers/bench';

// A quiet scale (s_r = 0.2 d) so the ±1 d stability window settles within a second or two.
const benchScale = (o: Parameters<typeof createScale>[0] = {}) => createScale({ repeatabilityG: 0.02, ...o });

describe('the bench (browser, simulated scale)', () => {
  let landscape: BrowserContext;
  let portrait: BrowserContext;
  beforeAll(async () => {
    landscape = await openBrowser({ width: 1280, height: 800 });
    portrait = await openBrowser({ width: 800, height: 1280 });
  });
  // A bench page keeps its simulated feed and live trace running: close each test's pages, so later
  // tests do not share the machine with them (the first page belongs to the browser profile).
  afterEach(async () => {
    for (const context of [landscape, portrait]) for (const page of context.pages().slice(1)) await page.close();
  });
  afterAll(async () => {
    await landscape.close();
    await portrait.close();
  });

  it('counts a part to its target with the keyboard: tare, sample of 10, grow, count, capture; the server records the count', async () => {
    const scale = await benchScale();
    const part = await createPart({ pieceSpread: 0.01 });
    const page = await landscape.newPage();
    await signInThroughPage(page, 'operator');
    await openBench(page, scale.id);
    await page.getByLabel('Target pieces (optional)').fill('100');
    await page.getByLabel('Allowed over').fill('2');
    await page.getByLabel('Scan or type a part number').fill(part.partNumber.toLowerCase());
    await page.getByLabel('Scan or type a part number').press('Enter');
    await expect.poll(() => page.getByRole('heading', { name: 'Put the empty container on the pan' }).isVisible()).toBe(true);
    await screenshot(page, 'bench-1-tare');

    await panButton(page, /Place container/);
    await waitSettled(page);
    await whenSettled(page, () => page.keyboard.press('t'), headingShown(page, /Count \d+ pieces onto the pan/));
    await page.getByLabel('Pieces in the sample').fill('10');
    await putOn(page, 10);
    await screenshot(page, 'bench-2-sample');
    await whenSettled(page, () => page.keyboard.press('s'), headingShown(page, 'Grow the sample (now 10 pcs)'));

    const maxAdd = Number(await page.getByTestId('grow-plan').getAttribute('data-max-add'));
    expect(maxAdd).toBeGreaterThanOrEqual(20);
    await putOn(page, 20);
    await screenshot(page, 'bench-3-grow');
    await whenSettled(page, () => page.keyboard.press('g'), headingShown(page, 'Grow the sample (now 30 pcs)'));
    await page.keyboard.press('n');
    await putOn(page, 70);
    expect(await liveCount(page)).toBe(100);
    await expect.poll(() => page.getByTestId('verdict').getAttribute('data-verdict')).toBe('in');
    await screenshot(page, 'bench-4-count');

    const result = page.getByTestId('capture-result');
    await whenSettled(
      page,
      () => page.keyboard.press('c'),
      async () => (await result.count()) === 1,
      CAPTURE_WAIT_MS,
    );
    expect(await result.getAttribute('data-count')).toBe('100');
    await screenshot(page, 'bench-5-captured');
    testDb();
    const events = await CountEvent.findAll({ where: { partId: part.id } });
    expect(events).toHaveLength(1);
    expect(events[0]).toMatchObject({ count: 100, exact: true, purpose: 'part', sampleQuantity: 30, sampleOnPan: true, targetQuantity: 100 });
    expect(Number(await result.getAttribute('data-id'))).toBe(events[0].id);
  });

  it('acts on steps pressed while the reading still moves, once it is steady, and keeps an idle tared pan settled for 15 s', { timeout: 90_000 }, async () => {
    // s_r = d/2: the readings of a still pan wander by about ±1 d. A slow pan (1.5 s to settle) leaves
    // the press well inside the settling, however busy the machine.
    const scale = await benchScale({ repeatabilityG: 0.05 });
    testDb();
    await Scale.update({ connection: { kind: 'simulator', settleMs: 1500, driftPerMinute: 0, rateHz: 20 } }, { where: { id: scale.id } });
    const part = await createPart({ pieceSpread: 0.01 });
    const page = await portrait.newPage();
    await signInThroughPage(page, 'operator');
    await openBench(page, scale.id);
    await page.getByLabel('Scan or type a part number').fill(part.partNumber);
    await page.getByLabel('Scan or type a part number').press('Enter');
    await expect.poll(() => page.getByRole('heading', { name: 'Put the empty container on the pan' }).isVisible()).toBe(true);

    // Each key is pressed once the pan has started to move, while it settles: the press waits, then acts.
    const moving = () => expect.poll(() => page.getByTestId('stability').textContent(), { timeout: 5000 }).not.toBe('Settled');
    await panButton(page, /Place container/);
    await moving();
    await page.keyboard.press('t');
    await expect.poll(() => page.getByTestId('waiting').isVisible(), { timeout: 2000 }).toBe(true);
    await screenshot(page, 'bench-waiting-steady');
    await expect.poll(headingShown(page, /Count \d+ pieces onto the pan/)).toBe(true);

    const seen: string[] = [];
    for (let t = 0; t < 15_000; t += 250) {
      seen.push((await page.getByTestId('stability').textContent()) ?? '');
      await page.waitForTimeout(250);
    }
    expect(seen.filter((x) => x !== 'Settled')).toEqual([]);

    await page.getByLabel('Pieces in the sample').fill('10');
    await page.getByLabel('Pieces', { exact: true }).fill('10');
    await panButton(page, 'Put on 10');
    await moving();
    await page.keyboard.press('s');
    await expect.poll(headingShown(page, 'Grow the sample (now 10 pcs)')).toBe(true);
    await page.getByLabel('Pieces', { exact: true }).fill('20');
    await panButton(page, 'Put on 20');
    await moving();
    await page.keyboard.press('g');
    await expect.poll(headingShown(page, 'Grow the sample (now 30 pcs)')).toBe(true);
    await page.keyboard.press('n');
    await page.getByLabel('Pieces', { exact: true }).fill('70');
    await panButton(page, 'Put on 70');
    await moving();
    await page.keyboard.press('c');
    await expect.poll(() => page.getByTestId('capture-result').count(), { timeout: CAPTURE_WAIT_MS }).toBe(1);
    expect(await page.getByTestId('capture-result').getAttribute('data-count')).toBe('100');
  });

  it('takes a wedge scan wherever focus is, and a second scan replaces the first', async () => {
    const scale = await benchScale();
    const part = await createPart({ pieceSpread: 0.01 });
    const first = await stockPart(part.id, 120);
    const second = await stockPart(part.id, 80);
    const page = await landscape.newPage();
    await signInThroughPage(page, 'clerk');
    await openBench(page, scale.id, 12);
    await page.getByText('Bin count — bin weighed apart').click();
    const field = page.getByLabel('Scan a bin label or type a part number');
    // Someone typed into the field, then scanned a label into it: the scan replaces the typing.
    await field.fill('wrong');
    await field.focus();
    await wedgeScan(page, second.code);
    await expect.poll(() => page.getByRole('heading', { name: 'Empty the pan and zero it' }).isVisible()).toBe(true);
    await expect.poll(() => page.locator('header').textContent()).toContain(second.code);
    // Stopping once the count has started asks first, saying what would be lost.
    await whenSettled(page, () => page.getByRole('button', { name: /Zero the empty pan/ }).click(), headingShown(page, /Count \d+ pieces onto the pan/));
    await page.getByRole('button', { name: 'Stop this count and choose other work' }).click();
    const ask = page.getByRole('alertdialog', { name: 'Please confirm' });
    await expect.poll(() => ask.textContent()).toContain('Stop this count? The tare taken for it will not be recorded.');
    await ask.getByRole('button', { name: 'Keep it as it is' }).click();
    await expect.poll(headingShown(page, /Count \d+ pieces onto the pan/)).toBe(true);
    await page.getByRole('button', { name: 'Stop this count and choose other work' }).click();
    await ask.getByRole('button', { name: 'Yes, stop and choose other work' }).click();
    // Focus on nothing in particular (a button): the scan still lands.
    await page.getByText('Bin count — bin weighed apart').click();
    await page.getByRole('heading', { name: 'What are you counting?' }).click();
    await wedgeScan(page, first.code);
    await expect.poll(() => page.locator('header').textContent()).toContain(first.code);
  });

  it('counts a kitting-queue line: the target comes from the order, and the capture fills the line', async () => {
    const scale = await benchScale();
    const part = await createPart({ pieceSpread: 0.01 });
    await stockPart(part.id, 500);
    const planner = await signedIn('planner');
    const kit = (
      await planner.agent
        .post('/api/v1/kits')
        .send({ code: unique('KIT'), revision: 'A', description: 'Bench kit', components: [{ partId: part.id, quantity: 10 }] })
    ).body.kit;
    // Due today: the queue lists dated orders first, so the suite's undated ones cannot push this line out of it.
    const draft = (await planner.agent.post('/api/v1/orders').send({ kitId: kit.id, quantity: 10, dueDate: new Date().toISOString().slice(0, 10) })).body.order;
    const order = (await planner.agent.post(`/api/v1/orders/${draft.id}/release`).send({ version: draft.version })).body.order;
    const page = await landscape.newPage();
    await signInThroughPage(page, 'operator');
    await openBench(page, scale.id, 5);
    await page.getByText('Kitting queue — lines of released orders').click();
    await page.getByLabel('Scan or type a part or order number').fill(part.partNumber);
    await page.getByLabel('Scan or type a part or order number').press('Enter');
    await expect.poll(() => page.getByRole('heading', { name: 'Put the empty container on the pan' }).isVisible()).toBe(true);
    await panButton(page, /Place container/);
    await waitSettled(page);
    await whenSettled(page, () => page.keyboard.press('t'), headingShown(page, /Count \d+ pieces onto the pan/));
    await page.getByLabel('Pieces in the sample').fill('10');
    await putOn(page, 10);
    await whenSettled(page, () => page.keyboard.press('s'), headingShown(page, 'Grow the sample (now 10 pcs)'));
    await putOn(page, 20);
    await whenSettled(page, () => page.keyboard.press('g'), headingShown(page, 'Grow the sample (now 30 pcs)'));
    await page.keyboard.press('n');
    await putOn(page, 70);
    await screenshot(page, 'bench-queue-count');
    const result = page.getByTestId('capture-result');
    await whenSettled(
      page,
      () => page.keyboard.press('c'),
      async () => (await result.count()) === 1,
      CAPTURE_WAIT_MS,
    );
    testDb();
    const line = await BuildOrderLine.findByPk(order.lines[0].id);
    expect(line).toMatchObject({ counted: 100, captures: 1, verdict: 'in' });
    expect((await planner.agent.get(`/api/v1/orders/${order.id}`)).body.order.status).toBe('in_progress');
  });

  it('counts a bin by touch on a portrait tablet: sample weighed apart, bin weighed in its container with the preset tare', async () => {
    const scale = await benchScale();
    const part = await createPart({ pieceSpread: 0.01 });
    testDb();
    const bin = await Container.create({ name: unique('Blue tote'), kind: 'tote', tareG: '400' });
    const stockBin = await stockPart(part.id, 310);
    const page = await portrait.newPage();
    await signInThroughPage(page, 'clerk');
    await openBench(page, scale.id, 11);
    await page.getByText('Bin count — bin weighed apart').click();
    // The bin's label carries its code as Code 128: a scanner types it and presses Enter.
    await page.getByLabel('Scan a bin label or type a part number').fill(stockBin.code.toLowerCase());
    await page.getByLabel('Scan a bin label or type a part number').press('Enter');
    // Blind by default: the counter does not see the book quantity before the count.
    await expect.poll(() => page.locator('header').textContent()).toContain(stockBin.code);
    expect(await page.locator('header').textContent()).not.toContain('book');
    await waitSettled(page);
    await whenSettled(page, () => page.getByRole('button', { name: /Zero the empty pan/ }).click(), headingShown(page, /Count \d+ pieces onto the pan/));
    await page.getByLabel('Pieces in the sample').fill('20');
    await putOn(page, 20);
    await screenshot(page, 'bench-bin-1-sample');
    await whenSettled(page, () => page.getByRole('button', { name: /Sample of 20 is on/ }).click(), headingShown(page, 'Put the bin on the pan'));
    await page.getByLabel('The bin’s container (its tare comes off)').selectOption(String(bin.id));
    await panButton(page, 'Empty the pan');
    await panButton(page, 'Place container (400 g)');
    await putOn(page, 300);
    await screenshot(page, 'bench-bin-2-count');
    const result = page.getByTestId('capture-result');
    await whenSettled(
      page,
      () => page.getByRole('button', { name: /Capture this count/ }).click(),
      async () => (await result.count()) === 1,
      CAPTURE_WAIT_MS,
    );
    await screenshot(page, 'bench-bin-3-captured');
    // The clerk is told what became of the bin, with the count's own range.
    expect(await page.getByTestId('bin-outcome').textContent()).toMatch(/^(Booked|Held for a decision|Nothing to change)/);
    const [event] = await CountEvent.findAll({ where: { partId: part.id } });
    expect(event).toMatchObject({ purpose: 'bin', sampleOnPan: false, sampleQuantity: 20, containerId: bin.id, binId: stockBin.id });
    const binCount = await BinCount.findOne({ where: { countEventId: event.id } });
    expect(binCount).toMatchObject({ bookQuantity: 310, counted: event.count, variance: event.count - 310 });
    expect(Number(event.tareG)).toBeCloseTo(400, 6);
    // A sample of 20 does not make 300 exact: the server says so with its ± range, which must hold the truth.
    expect(Math.abs(event.count - 300)).toBeLessThanOrEqual(Math.max(0, Math.round(Number(event.expandedUncertainty))));
    expect(Number(await result.getAttribute('data-count'))).toBe(event.count);
  });

  it('warns in plain words when one piece is lighter than the scale division', async () => {
    const scale = await benchScale({ divisionG: 0.1 });
    const part = await createPart({ apwG: 0.04 });
    const page = await landscape.newPage();
    await signInThroughPage(page, 'operator');
    await openBench(page, scale.id, 3);
    await page.getByLabel('Scan or type a part number').fill(part.partNumber);
    await page.getByLabel('Scan or type a part number').press('Enter');
    await waitSettled(page); // the practice pan starts afresh with the chosen part
    await whenSettled(page, () => page.getByRole('button', { name: /Tare now/ }).click(), headingShown(page, /Count \d+ pieces onto the pan/));
    await page.getByLabel('Pieces in the sample').fill('10');
    await putOn(page, 10);
    await whenSettled(page, () => page.getByRole('button', { name: /Sample of 10 is on/ }).click(), headingShown(page, /Grow the sample/));
    const warning = page.locator('[data-warning="apw_below_resolution"]');
    await expect.poll(() => warning.isVisible()).toBe(true);
    expect(await warning.textContent()).toContain('One piece weighs less than the smallest step this scale shows');
    expect(await warning.textContent()).toContain('finer division');
    expect(await page.locator('[data-warning="cv_assumed"]').isVisible()).toBe(true);
    await screenshot(page, 'bench-too-light');
  });

  it('shows a locked scale with its reason and does not offer the capture', async () => {
    const scale = await benchScale({ status: 'locked' });
    const part = await createPart({ pieceSpread: 0.01 });
    const page = await landscape.newPage();
    await signInThroughPage(page, 'quality');
    await openBench(page, scale.id, 5);
    expect(await page.getByTestId('scale-status').textContent()).toContain('failed its weighing test');
    expect(await page.locator('[data-warning="scale_locked"]').isVisible()).toBe(true);
    await page.getByLabel('Scan or type a part number').fill(part.partNumber);
    await page.getByLabel('Scan or type a part number').press('Enter');
    await waitSettled(page); // the practice pan starts afresh with the chosen part
    await whenSettled(page, () => page.getByRole('button', { name: /Tare now/ }).click(), headingShown(page, /Count \d+ pieces onto the pan/));
    await putOn(page, 10);
    await whenSettled(page, () => page.getByRole('button', { name: /Sample of 10 is on/ }).click(), headingShown(page, /Grow the sample/));
    await page.getByRole('button', { name: /Count to target/ }).click();
    expect(await page.getByRole('button', { name: /Capture this count/ }).isDisabled()).toBe(true);
    expect(await page.getByTestId('capture-blocked').textContent()).toContain('locked');
  });

  it('shows a lock made elsewhere at the open bench within 5 s, with its reason, without restarting the feed', async () => {
    const scale = await benchScale();
    const page = await landscape.newPage();
    await signInThroughPage(page, 'operator');
    await openBench(page, scale.id, 6);
    expect(await page.getByTestId('scale-status').getAttribute('data-status')).toBe('in_service');
    const { agent: quality } = await signedIn('quality');
    const locked = await quality.post(`/api/v1/scales/${scale.id}/lock`).send({ reason: 'dropped on the floor' });
    expect(locked.status).toBe(200);
    await expect.poll(() => page.getByTestId('scale-status').getAttribute('data-status'), { timeout: 5000 }).toBe('locked');
    expect(await page.getByTestId('scale-status').textContent()).toContain('dropped on the floor');
    expect(await page.getByTestId('stability').textContent()).toBe('Settled'); // the feed carried on
  });

  it('restores a count in progress after a reload, pieces on the practice pan included', async () => {
    const scale = await benchScale();
    const part = await createPart({ pieceSpread: 0.01 });
    const page = await landscape.newPage();
    await signInThroughPage(page, 'operator');
    await openBench(page, scale.id, 21);
    await page.getByLabel('Scan or type a part number').fill(part.partNumber);
    await page.getByLabel('Scan or type a part number').press('Enter');
    await panButton(page, /Place container/);
    await waitSettled(page);
    await whenSettled(page, () => page.getByRole('button', { name: /Tare now/ }).click(), headingShown(page, /Count \d+ pieces onto the pan/));
    await putOn(page, 10);
    await whenSettled(page, () => page.getByRole('button', { name: /Sample of 10 is on/ }).click(), headingShown(page, /Grow the sample/));
    await putOn(page, 15);
    expect(await liveCount(page)).toBe(25);
    await page.reload();
    await expect.poll(() => page.getByRole('heading', { name: 'Grow the sample (now 10 pcs)' }).isVisible(), { timeout: 10_000 }).toBe(true);
    await expect.poll(() => page.getByTestId('stability').textContent(), { timeout: 10_000 }).toBe('Settled');
    expect(await liveCount(page)).toBe(25);
    expect(await page.getByTestId('pan-contents').textContent()).toContain('25 pieces');
    await screenshot(page, 'bench-restored');
  });

  it('keeps one bench per browser: a second tab says where it is, takes it over with the count in progress, and gives it back when closed', async () => {
    const scale = await benchScale();
    const part = await createPart({ pieceSpread: 0.01 });
    const first = await landscape.newPage();
    await signInThroughPage(first, 'operator');
    await openBench(first, scale.id, 5);
    await first.getByLabel('Scan or type a part number').fill(part.partNumber);
    await first.getByLabel('Scan or type a part number').press('Enter');
    await panButton(first, /Place container/);
    await waitSettled(first);
    await whenSettled(first, () => first.getByRole('button', { name: /Tare now/ }).click(), headingShown(first, /Count \d+ pieces onto the pan/));

    const second = await landscape.newPage();
    await second.goto('/bench');
    await expect.poll(() => second.getByTestId('bench-tab').textContent()).toContain('The bench is open in another tab');
    await screenshot(second, 'bench-second-tab');
    await second.getByRole('button', { name: 'Count here instead' }).click();
    await expect.poll(headingShown(second, /Count \d+ pieces onto the pan/)).toBe(true);
    await expect.poll(() => first.getByTestId('bench-tab').textContent()).toContain('The bench moved to another tab');

    await second.close();
    await expect.poll(headingShown(first, /Count \d+ pieces onto the pan/)).toBe(true);
  });

  it('queues a capture made offline and sends it exactly once when back online', async () => {
    const scale = await benchScale();
    const part = await createPart({ pieceSpread: 0.01 });
    const page = await landscape.newPage();
    await signInThroughPage(page, 'operator');
    await openBench(page, scale.id, 31);
    await page.getByLabel('Scan or type a part number').fill(part.partNumber);
    await page.getByLabel('Scan or type a part number').press('Enter');
    await waitSettled(page); // the practice pan starts afresh with the chosen part
    await whenSettled(page, () => page.getByRole('button', { name: /Tare now/ }).click(), headingShown(page, /Count \d+ pieces onto the pan/));
    await putOn(page, 10);
    await whenSettled(page, () => page.getByRole('button', { name: /Sample of 10 is on/ }).click(), headingShown(page, /Grow the sample/));
    await page.getByRole('button', { name: /Count to target/ }).click();
    await putOn(page, 10);
    await landscape.setOffline(true);
    const queued = page.getByTestId('capture-queue').locator('li');
    await whenSettled(
      page,
      () => page.getByRole('button', { name: /Capture this count/ }).click(),
      async () => (await queued.count()) === 1,
      CAPTURE_WAIT_MS,
    );
    const key = (await queued.first().getAttribute('data-key'))!;
    await screenshot(page, 'bench-offline-queued');
    testDb();
    expect(await CountEvent.count({ where: { partId: part.id } })).toBe(0);
    await landscape.setOffline(false);
    await page
      .getByRole('button', { name: 'Send now' })
      .click({ timeout: 1000 })
      .catch(() => undefined); // the 'online' event may have sent it already
    await expect.poll(() => page.getByTestId('capture-queue').count(), { timeout: 15_000 }).toBe(0);
    const events = await CountEvent.findAll({ where: { partId: part.id } });
    expect(events).toHaveLength(1);
    expect(events[0].idempotencyKey).toBe(key);
    expect(events[0].count).toBe(20);
  });
});
