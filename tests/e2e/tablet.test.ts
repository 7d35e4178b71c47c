import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { navFor } from '../../lib/navigation';
import { openBrowser, screenshot, signInThroughPage } from '../helpers/browser';
import { createPart, createScale, stockPart } from '../helpers/db';
import { signedIn } from '../helpers/http';
import { releasedOrder } from '../helpers/orders';
import { openBench, putOn } from '../helpers/bench';

// Every page at a portrait 10-inch tablet (800 × 1280) and its landscape (1280 × 800): nothing
// scrolls sideways, controls are touch-sized (44 px, WCAG 2.5.5), and a screenshot of each is kept.
const VIEWPORTS = [
  { width: 800, height: 1280 },
  { width: 1280, height: 800 },
];

const slug = (path: string) => path.replace(/^\//, '').replace(/[^a-z0-9]+/gi, '-') || 'today';

async function sidewaysOverflow(page: Page): Promise<number> {
  return page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
}

/** Visible buttons, selects and text fields in the page that are shorter than 44 px (labels of checkboxes are the target, not the box). */
async function smallControls(page: Page): Promise<string[]> {
  return page.evaluate(() =>
    [
      ...document.querySelectorAll<HTMLElement>(
        'main button, main select, main input:not([type=checkbox]):not([type=radio]):not([type=hidden]):not([type=file]), main [role=tab]',
      ),
    ]
      .filter((el) => el.offsetParent !== null && !el.closest('.ag-root-wrapper'))
      .map((el) => [el, el.getBoundingClientRect()] as const)
      .filter(([, r]) => r.height < 43.5)
      .map(
        ([el, r]) =>
          `${el.tagName.toLowerCase()} "${(el.textContent || el.getAttribute('aria-label') || el.getAttribute('name') || '').trim().slice(0, 40)}" ${Math.round(r.height)} px`,
      ),
  );
}

describe('pages on a tablet (browser)', () => {
  const contexts: BrowserContext[] = [];
  let extraPages: string[] = [];
  beforeAll(async () => {
    const { agent } = await signedIn('planner');
    const { kit, order } = await releasedOrder(agent);
    const scale = await createScale();
    extraPages = [`/orders/${order.id}`, `/kits/${kit.id}`, `/scales/${scale.id}`];
    for (const viewport of VIEWPORTS) contexts.push(await openBrowser(viewport));
  });
  afterAll(async () => {
    for (const c of contexts) await c.close();
  });

  for (const [i, viewport] of VIEWPORTS.entries()) {
    const size = `${viewport.width}x${viewport.height}`;
    it(`shows every page an administrator can reach at ${size} without sideways scrolling, with touch-sized controls`, async () => {
      const page = await contexts[i].newPage();
      await signInThroughPage(page, 'admin');
      const problems: string[] = [];
      for (const path of [...navFor('admin').map((n) => n.href), ...extraPages]) {
        await page.goto(path);
        await page.getByRole('heading', { level: 1 }).first().waitFor();
        // Grids and charts lay out after the first paint.
        await page.waitForTimeout(400);
        if (await page.getByText('This page could not be shown').count()) problems.push(`${path}: shows the error page`);
        const overflow = await sidewaysOverflow(page);
        if (overflow > 0) problems.push(`${path}: scrolls ${overflow} px sideways`);
        for (const small of await smallControls(page)) problems.push(`${path}: ${small}`);
        await screenshot(page, `tablet-${size}-${slug(path)}`);
      }
      expect(problems).toEqual([]);
      await page.close();
    }, 180_000);
  }

  it('folds the navigation into a menu on a portrait tablet, and shows grids as cards with the same actions', async () => {
    const part = await createPart();
    await stockPart(part.id, 50);
    const page = await contexts[0].newPage();
    await signInThroughPage(page, 'clerk');
    expect(await page.getByRole('navigation', { name: 'Main' }).count()).toBe(0);
    const menu = page.getByRole('button', { name: 'Menu' });
    expect(await menu.getAttribute('aria-expanded')).toBe('false');
    await menu.click();
    await screenshot(page, 'tablet-menu-open');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Parts' }).click();
    await page.waitForURL((u) => u.pathname === '/parts');
    // Following a link folds the menu again.
    await expect.poll(() => page.getByRole('navigation', { name: 'Main' }).count()).toBe(0);

    const cards = page.getByRole('region', { name: 'Parts' });
    const card = cards.locator('li', { hasText: part.partNumber }).first();
    await card.waitFor();
    const box = await card.getByRole('button', { name: `Edit ${part.partNumber}` }).boundingBox();
    expect(box!.height).toBeGreaterThanOrEqual(44);
    await screenshot(page, 'tablet-parts-cards');
    await page.close();
  });

  it('keeps the bench readout on screen while the practice pan is used on a portrait tablet', async () => {
    const scale = await createScale({ repeatabilityG: 0.02 });
    const page = await contexts[0].newPage();
    await signInThroughPage(page, 'operator');
    await openBench(page, scale.id);
    const pan = page.getByRole('region', { name: /Practice pan/ });
    await pan.scrollIntoViewIfNeeded();
    await putOn(page, 10);
    const readout = await page.getByRole('region', { name: 'Live reading' }).boundingBox();
    const panBox = await pan.boundingBox();
    expect(readout).not.toBeNull();
    expect(readout!.y).toBeGreaterThanOrEqual(0);
    expect(readout!.y + readout!.height).toBeLessThanOrEqual(1280);
    expect(panBox!.y).toBeLessThan(1280);
    await page.screenshot({ path: 'test-results/screenshots/tablet-bench-pinned.png' });
    await page.close();
  });
});
