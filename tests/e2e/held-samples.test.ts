import type { BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Part, PieceWeightSample } from '../../models';
import { createPart, createScale, testDb } from '../helpers/db';
import { openBrowser, screenshot, signInThroughPage } from '../helpers/browser';
import { baseUrl, signedIn } from '../helpers/http';

describe('samples held for review (browser)', () => {
  let desk: BrowserContext;
  beforeAll(async () => {
    desk = await openBrowser({ width: 800, height: 1280 });
  });
  afterAll(async () => {
    await desk.close();
  });

  it("a quality engineer sees a sample far from its part's history, is told what accepting does, and accepts it", async () => {
    const { agent } = await signedIn('operator');
    const part = await createPart();
    const scale = await createScale({ divisionG: 0.001, eG: 0.01, capacityG: 600, repeatabilityG: 0.0005 });
    for (const netWeight of [24.06, 24.1])
      expect((await agent.post(`/api/v1/parts/${part.id}/samples`).send({ scaleId: scale.id, quantity: 20, netWeight })).status).toBe(201);
    const far = await agent.post(`/api/v1/parts/${part.id}/samples`).send({ scaleId: scale.id, quantity: 20, netWeight: 30 });
    expect(far.body.held).toBe(true);

    const page = await desk.newPage();
    await signInThroughPage(page, 'quality');
    await page.goto(`${baseUrl()}/parts`);
    const row = page.getByTestId(`held-${far.body.sample.id}`);
    await expect.poll(() => row.isVisible()).toBe(true);
    await row.getByRole('button', { name: 'Accept…' }).click();
    await expect.poll(() => row.textContent()).toMatch(/Accepting makes 1\.5 g the piece weight of .+ \(now 1\.205 g\)/);
    await screenshot(page, 'held-sample-confirm');
    await row.getByRole('button', { name: 'Yes, accept' }).click();
    await expect.poll(() => page.getByTestId('held-samples').getByRole('status').textContent()).toContain('sample accepted');
    testDb();
    await expect.poll(async () => (await PieceWeightSample.findByPk(far.body.sample.id))!.status).toBe('accepted');
    expect(Number((await Part.findByPk(part.id))!.apwG)).toBeCloseTo(1.5, 9);
  });
});
