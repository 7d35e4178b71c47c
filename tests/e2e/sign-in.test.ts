import type { BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { navFor } from '../../lib/navigation';
import { ROLE_LABELS, ROLES } from '../../lib/roles';
import { createUser, TEST_PASSWORD } from '../helpers/db';
import { baseUrl } from '../helpers/http';
import { openBrowser, screenshot, signInThroughPage } from '../helpers/browser';

describe('signing in (browser)', () => {
  let browser: BrowserContext;
  beforeAll(async () => {
    browser = await openBrowser();
  });
  afterAll(async () => {
    await browser.close();
  });

  it('sends a signed-out visitor to the sign-in page and back to where they were going', async () => {
    const page = await browser.newPage();
    await page.goto('/admin/users');
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    await screenshot(page, 'sign-in');
    const user = await createUser('admin');
    await page.getByLabel('E-mail').fill(user.email);
    await page.getByLabel('Password').fill('wrong password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect.poll(() => page.getByRole('status').first().textContent()).toMatch(/do not match/);
    await screenshot(page, 'sign-in-wrong-password');
    await page.close();
  });

  for (const role of ROLES) {
    it(`signs in as ${role} and lands on Today with the ${role}'s navigation`, async () => {
      const page = await browser.newPage();
      const { name } = await signInThroughPage(page, role);
      await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent()).toContain(name.split(' ')[0]);
      expect(await page.getByText(ROLE_LABELS[role]).first().isVisible()).toBe(true);
      const links = await page.getByRole('navigation', { name: 'Main' }).getByRole('link').allTextContents();
      expect(links).toEqual(navFor(role).map((i) => i.label));
      await screenshot(page, `today-${role}`);
      await page.getByRole('button', { name: 'Sign out' }).first().click();
      await page.waitForURL((url) => url.pathname === '/sign-in');
      await page.close();
    });
  }

  it('follows `next` after sign-in only to a page of the app, however the address is dressed up', async () => {
    const user = await createUser('planner');
    // One page throughout: opening a page right after closing one whose prefetches were in flight
    // sometimes never returned in this Chromium.
    const page = await browser.newPage();
    for (const next of ['/\\evil.test', '/%09/evil.test', '/%5Cevil.test', '/%0a/evil.test']) {
      await page.goto(`/sign-in?next=${next}`);
      await page.getByLabel('E-mail').fill(user.email);
      await page.getByLabel('Password').fill(TEST_PASSWORD);
      await page.getByRole('button', { name: 'Sign in' }).click();
      // Wherever it goes (another host would not even load here), it must leave the sign-in page for the app.
      await page.waitForURL((url) => url.pathname !== '/sign-in', { waitUntil: 'commit' });
      expect(new URL(page.url()).origin, next).toBe(new URL(baseUrl()).origin);
      await browser.clearCookies();
    }
    await page.close();
  });

  it('keeps the sign-in fields closed until the page script runs, so the browser never posts a password itself', async () => {
    const scriptless = await openBrowser(undefined, { javaScriptEnabled: false });
    try {
      const page = await scriptless.newPage();
      await page.goto('/sign-in');
      for (const field of [page.getByLabel('E-mail'), page.getByLabel('Password'), page.getByRole('button', { name: 'Sign in' })]) {
        expect(await field.isDisabled()).toBe(true);
      }
      expect(await page.locator('form').getAttribute('method')).toBe('post');
    } finally {
      await scriptless.close();
    }
    const page = await browser.newPage();
    await page.goto('/sign-in');
    await expect.poll(() => page.getByLabel('E-mail').isEnabled()).toBe(true);
    await expect.poll(() => page.evaluate(() => document.activeElement?.getAttribute('name'))).toBe('email');
    await page.close();
  });

  it('answers a role without the right 403 with an explanation, at the address it asked for', async () => {
    const page = await browser.newPage();
    await signInThroughPage(page, 'operator');
    const res = await page.goto('/admin/users');
    expect(res?.status()).toBe(403);
    expect(new URL(page.url()).pathname).toBe('/admin/users');
    expect(await page.getByTestId('forbidden').textContent()).toMatch(/Manage scales' profiles, users and site settings/i);
    await screenshot(page, 'forbidden');
    await page.close();
  });
});
