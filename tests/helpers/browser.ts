// Debian's Chromium driven by playwright-core; each test gets a fresh profile.
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import type { Role } from '../../lib/roles';
import { createUser, TEST_PASSWORD } from './db';
import { baseUrl } from './http';

export const SCREENSHOT_DIR = path.resolve(__dirname, '../../test-results/screenshots');

// The profile folder goes when the browser closes, so runs do not pile them up in /tmp.
export async function openBrowser(viewport = { width: 1280, height: 800 }, { javaScriptEnabled = true } = {}): Promise<BrowserContext> {
  const profile = mkdtempSync(path.join(os.tmpdir(), 'tallyforge-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: '/usr/bin/chromium',
    headless: true,
    viewport,
    javaScriptEnabled,
    baseURL: baseUrl(),
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  // Once close() resolves the browser process has exited and nothing writes to the profile any more.
  const close = context.close.bind(context);
  context.close = async (options) => {
    await close(options);
    rmSync(profile, { recursive: true, force: true, maxRetries: 3 });
  };
  return context;
}

export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  await page.screenshot({ path: path.join(SCREENSHOT_DIR, `${name}.png`), fullPage: true });
}

// Signs in through the sign-in page, as a person would.
export async function signInThroughPage(page: Page, role: Role): Promise<{ email: string; name: string }> {
  const user = await createUser(role, { name: `Dana ${role[0].toUpperCase()}${role.slice(1)}` });
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(user.email);
  await page.getByLabel('Password').fill(TEST_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => url.pathname === '/');
  return { email: user.email, name: user.name };
}

// Follows a link of the main navigation, opening the folded menu first where the page is narrow.
export async function followNav(page: Page, name: string): Promise<void> {
  const menu = page.getByRole('button', { name: 'Menu' });
  if (await menu.isVisible()) await menu.click();
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name }).click();
}

// A grid's rows at desk width, or the cards that stand for them below it.
export function gridRows(page: Page, label: string, hasText: string) {
  const region = page.getByRole('region', { name: label });
  return region.locator('[role=row], li').filter({ hasText });
}
