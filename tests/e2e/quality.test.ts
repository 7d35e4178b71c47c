import { randomUUID } from 'node:crypto';
import type { BrowserContext, Page } from 'playwright-core';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createPart, createScale, createTestWeight, TEST_PASSWORD, unique } from '../helpers/db';
import { openBrowser, screenshot, signInThroughPage } from '../helpers/browser';
import { baseUrl, signedIn, type Agent } from '../helpers/http';

// Days are UTC; a population runs from the day of its first capture to today, so a run over midnight keeps it whole.
const today = () => new Date().toISOString().slice(0, 10);
// Saves that close an audit also mail every quality engineer and planner before answering; under a
// full suite that can take longer than expect.poll's one-second default.
const SAVED = { timeout: 15_000 };

// An API agent for the person signed in in the browser, to build their part of the world.
async function agentFor(email: string): Promise<Agent> {
  const agent = request.agent(baseUrl());
  const res = await agent.post('/api/v1/session').send({ email, password: TEST_PASSWORD });
  expect(res.status).toBe(200);
  return agent;
}

// Ten captures by an operator and an audit of them, through the API.
async function openAudit(): Promise<number> {
  const operator = await signedIn('operator');
  const quality = await signedIn('quality');
  const part = await createPart({ pieceSpread: 0.001 });
  const scale = await createScale({ divisionG: 0.01, eG: 0.1, capacityG: 600, repeatabilityG: 0 });
  const from = today();
  for (let i = 0; i < 10; i++) {
    await operator.agent
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send(partCapture(part.id, scale.id, i));
  }
  const res = await quality.agent.post('/api/v1/audits').send({ population: { from, to: today(), partId: part.id }, aql: 2.5 });
  expect(res.status).toBe(201);
  return res.body.audit.id;
}

// A 20-piece sample of 0.25 g parts, then 100 to 109 pieces on the pan.
function partCapture(partId: number, scaleId: number, i: number) {
  return { purpose: 'part', partId, scaleId, gross: 25 + i * 0.25, tare: 0, sample: { quantity: 20, netWeight: 5 }, stable: true };
}

async function fillTest(page: Page, indications: string[], weights: string[][]) {
  for (const [i, indication] of indications.entries()) {
    const point = page.getByTestId(`test-point-${i}`);
    await point.getByLabel(`Indication ${i + 1} (g)`).fill(indication);
    for (const id of weights[i]) await point.getByLabel(id).check();
  }
  for (const [i, v] of ['3000', '3000', '3000.5'].entries()) await page.getByLabel(`Weighing ${i + 1} (g)`).fill(v);
  for (let i = 0; i < 4; i++) await page.getByLabel(`Position ${i + 1} (g)`).fill('2000');
}

describe('quality pages (browser)', () => {
  let desk: BrowserContext;
  let second: BrowserContext;
  beforeAll(async () => {
    desk = await openBrowser();
    second = await openBrowser();
  });
  afterAll(async () => {
    await desk.close();
    await second.close();
  });

  it('a quality engineer records a failing test, which locks the scale with the reason, then a passing one, which puts it back in service', async () => {
    // Class III, e = 1 g, Max 6 kg: default loads 20 g (Min), 500 g, 2 000 g and 6 000 g.
    const scale = await createScale({ name: unique('Kitting scale') });
    const w = await Promise.all([createTestWeight(20), createTestWeight(500), createTestWeight(2000), createTestWeight(5000), createTestWeight(1000)]);
    const sets = [[w[0].identifier], [w[1].identifier], [w[2].identifier], [w[3].identifier, w[4].identifier]];
    const page = await desk.newPage();
    await signInThroughPage(page, 'quality');
    await page.goto(`/scales/${scale.id}`);
    expect(await page.getByTestId('test-point-3').getByLabel('Load 4 (g)').inputValue()).toBe('6000');

    // At 2 000 g (2 000 e) the in-service MPE is 2 g (OIML R 76-1 Table 6, doubled): 4 g over fails.
    await fillTest(page, ['20', '500', '2004', '6001'], sets);
    await expect.poll(() => page.getByTestId('live-verdict').textContent()).toContain('Would fail');
    await screenshot(page, 'scale-test-failing');
    await page.getByRole('button', { name: 'Save test record' }).click();
    await expect.poll(() => page.getByTestId('test-outcome').textContent(), SAVED).toContain('locked out');
    await expect.poll(() => page.locator('main header').getByTestId('scale-status').textContent()).toMatch(/Locked out.*error beyond MPE at 2000 g/);

    await fillTest(page, ['20', '500', '2001', '6001'], sets);
    await expect.poll(() => page.getByTestId('live-verdict').textContent()).toContain('Would pass');
    await page.getByRole('button', { name: 'Save test record' }).click();
    await expect.poll(() => page.getByTestId('test-outcome').textContent(), SAVED).toContain('passed');
    await expect.poll(() => page.locator('main header').getByTestId('scale-status').textContent()).toMatch(/^●In service$/);
    expect(await page.getByRole('list', { name: 'Calibration history' }).getByRole('listitem').count()).toBe(2);
    await screenshot(page, 'scale-after-tests');

    await page.goto('/scales');
    await expect.poll(() => page.getByTestId(`scale-row-${scale.id}`).textContent()).toContain('In service');
    await page.close();
  });

  it('runs a count audit from the sampling plan to the lot verdict, keyed in with Enter', async () => {
    const operator = await signedIn('operator');
    // Sorts first among the suite's parts, so it is in the audit form's list of parts however many exist.
    const part = await createPart({ partNumber: unique('0AUD').toUpperCase(), pieceSpread: 0.001 });
    const scale = await createScale({ divisionG: 0.01, eG: 0.1, capacityG: 600, repeatabilityG: 0 });
    const from = today();
    for (let i = 0; i < 10; i++) {
      const res = await operator.agent
        .post('/api/v1/counts')
        .set('Idempotency-Key', randomUUID())
        .send(partCapture(part.id, scale.id, i));
      expect(res.status).toBe(201);
    }
    const page = await desk.newPage();
    const me = await signInThroughPage(page, 'quality');
    await page.goto('/quality/audits');
    // ISO 2859-1: a lot of 500 at level II is code letter H, n = 50; at AQL 1.0 Ac 1, Re 2.
    await page.getByLabel('Lot size (counts)').fill('500');
    await expect.poll(() => page.getByTestId('sampling-plan').textContent()).toBe('Code letterHSample size n50Accept (Ac)≤ 1Reject (Re)≥ 2');

    const form = page.getByRole('form', { name: 'Start an audit' });
    await form.getByLabel('Counted from').fill(from);
    await form.getByLabel('Counted to').fill(today());
    await form.getByLabel('Part').selectOption(String(part.id));
    await form.getByLabel('AQL (%)').selectOption('2.5');
    await form.getByLabel('Seed (optional)').fill('12345');
    await form.getByRole('button', { name: 'Draw the sample' }).click();
    await page.waitForURL(/\/quality\/audits\/\d+$/);
    expect(await page.getByTestId('audit-seed').textContent()).toContain('seed 12345');

    const auditId = page.url().split('/').pop();
    const audit = (await (await agentFor(me.email)).get(`/api/v1/audits/${auditId}`)).body.audit;
    expect(audit).toMatchObject({ lotSize: 10, sampleSize: 5, accept: 0, reject: 1 });
    await screenshot(page, 'audit-open');
    // Everything right except the first, two pieces off: outside its ± U, so the lot (Ac 0) is rejected.
    await page.getByLabel(/^Hand count for item 1/).focus();
    for (const [i, item] of audit.items.entries()) {
      await expect
        .poll(() => page.evaluate(() => document.activeElement?.getAttribute('aria-label') ?? ''), SAVED)
        .toMatch(new RegExp(`^Hand count for item ${i + 1},`));
      await page.keyboard.type(String(i === 0 ? item.count - 2 : item.count));
      await page.keyboard.press('Enter');
    }
    await expect.poll(() => page.getByTestId('lot-verdict').textContent(), SAVED).toContain('lot rejected');
    expect(await page.getByTestId('lot-verdict').textContent()).toContain('1 of 5 recounts outside their stated uncertainty');
    expect(await page.getByTestId('audit-item-0').textContent()).toContain('outside ± U');
    expect(await page.getByTestId('audit-item-1').textContent()).toContain('within ± U');
    await screenshot(page, 'audit-rejected');

    await page.goto(`/quality/reports?from=${from}&to=${today()}&by=part`);
    await expect
      .poll(() =>
        page
          .getByRole('table', { name: 'Accuracy by group' })
          .getByRole('row', { name: new RegExp(part.partNumber) })
          .textContent(),
      )
      .toContain('20.0 %');
    await page.close();
  });

  it('a clerk sees the variance they raised waiting, and a quality engineer approves it with a note', async () => {
    const clerkPage = await desk.newPage();
    const clerk = await signInThroughPage(clerkPage, 'clerk');
    const api = await agentFor(clerk.email);
    const part = await createPart({ pieceSpread: 0.001 });
    const scale = await createScale({ divisionG: 0.01, eG: 0.1, capacityG: 600, repeatabilityG: 0 });
    const code = `VZ-${String(1 + Math.floor(Math.random() * 99)).padStart(2, '0')}-${1 + Math.floor(Math.random() * 9)}-${String(1 + Math.floor(Math.random() * 99)).padStart(2, '0')}`;
    const bin = (await api.post('/api/v1/bins').send({ code, partId: part.id, bookQuantity: 1000, abcClass: 'A' })).body.bin;
    // 900 of 1 000 counted (0.5 g pieces): 100 pieces and 10 %, beyond both default limits.
    const capture = await api
      .post('/api/v1/counts')
      .set('Idempotency-Key', randomUUID())
      .send({
        purpose: 'bin',
        binId: bin.id,
        binVersion: bin.version,
        partId: part.id,
        scaleId: scale.id,
        gross: 450,
        tare: 0,
        sample: { quantity: 20, netWeight: 10 },
        sampleOnPan: false,
        stable: true,
      });
    expect(capture.body.binCount).toMatchObject({ status: 'pending', variance: -100 });

    await clerkPage.goto('/');
    expect(Number(await clerkPage.getByTestId('waiting-variances-raised').locator('.num').textContent())).toBeGreaterThanOrEqual(1);
    await clerkPage.getByTestId('waiting-variances-raised').click();
    await clerkPage.waitForURL('**/bins/variances');
    const card = clerkPage.getByTestId(`variance-${bin.code}`);
    expect(await card.textContent()).toContain('-100 pcs (10 %)');
    expect(await card.getByRole('button', { name: 'Approve' }).count()).toBe(0);
    await screenshot(clerkPage, 'variances-clerk');

    const qualityPage = await second.newPage();
    await signInThroughPage(qualityPage, 'quality');
    await qualityPage.goto('/bins/variances');
    const decide = qualityPage.getByTestId(`variance-${bin.code}`);
    await decide.getByLabel('Note (optional)').fill('found a torn bag');
    await decide.getByRole('button', { name: 'Approve' }).click();
    // Asked once more, with what approving does to the book.
    const ask = decide.getByRole('alertdialog', { name: 'Please confirm' });
    await expect.poll(() => ask.textContent()).toContain(`Approve -100 pcs on ${bin.code}? Its book quantity becomes 900 (from 1000).`);
    await ask.getByRole('button', { name: 'Yes, approve' }).click();
    await expect.poll(() => qualityPage.getByTestId('variance-notice').textContent(), SAVED).toBe(`${bin.code}: approved, book quantity now 900.`);
    expect(await qualityPage.getByTestId(`variance-${bin.code}`).count()).toBe(0);

    await clerkPage.goto('/bins');
    await clerkPage.getByLabel('Find bins').fill(bin.code);
    await clerkPage.getByRole('button', { name: 'Search' }).click();
    await expect.poll(() => clerkPage.getByTestId('bins-summary').textContent()).toBe(`1–1 of 1 bin starting “${bin.code}”.`);
    await expect.poll(() => clerkPage.getByRole('row', { name: new RegExp(bin.code) }).textContent()).toContain('900');
    await clerkPage.close();
    await qualityPage.close();
  });

  for (const viewport of [
    { width: 1280, height: 800 },
    { width: 800, height: 1280 },
  ]) {
    it(`shows every quality and stockroom page to an admin at ${viewport.width}×${viewport.height}`, async () => {
      const browser = await openBrowser(viewport);
      const page = await browser.newPage();
      await signInThroughPage(page, 'admin');
      const scale = await createScale({ name: unique('Look scale') });
      const auditId = await openAudit();
      const paths: Array<[string, string]> = [
        ['/', 'today'],
        ['/scales', 'scales'],
        [`/scales/${scale.id}`, 'scale'],
        ['/quality/test-weights', 'test-weights'],
        ['/quality/audits', 'audits'],
        [`/quality/audits/${auditId}`, 'audit'],
        ['/quality/reports', 'reports'],
        ['/bins', 'bins'],
        ['/bins/variances', 'variances'],
      ];
      for (const [path, name] of paths) {
        await page.goto(path);
        // The shell streams a loading placeholder first; wait for the page's own title.
        await expect.poll(() => page.getByRole('heading', { level: 1 }).count(), { message: path }).toBe(1);
        expect(await page.getByText('This page could not be shown').count(), path).toBe(0);
        await screenshot(page, `${name}-${viewport.width}x${viewport.height}`);
      }
      await browser.close();
    });
  }
});
