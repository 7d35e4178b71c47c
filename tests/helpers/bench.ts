// Steps of the bench page for browser tests, on the simulator's practice pan.
import type { Page } from 'playwright-core';
import { expect } from 'vitest';

/** Waits for the pan to move and settle again after a change on the practice pan. */
export async function waitSettled(page: Page): Promise<void> {
  const badge = page.getByTestId('stability');
  await expect.poll(() => badge.textContent(), { timeout: 5000 }).not.toBe('Settled');
  await expect.poll(() => badge.textContent(), { timeout: 10_000 }).toBe('Settled');
}

export async function panButton(page: Page, name: string | RegExp): Promise<void> {
  await page.getByRole('region', { name: /Practice pan/ }).getByRole('button', { name }).click();
}

export async function putOn(page: Page, n: number): Promise<void> {
  await page.getByLabel('Pieces', { exact: true }).fill(String(n));
  await panButton(page, `Put on ${n}`);
  await waitSettled(page);
}

/** Opens the bench on a clean workstation (the browser profile is shared by a file's tests). */
export async function openBench(page: Page, scaleId: number, seed = 7): Promise<void> {
  // Cleared from a page that does not run the bench, which would save its work again.
  await page.goto('/api/v1/health');
  await page.evaluate(() => window.localStorage.clear());
  await page.goto(`/bench?seed=${seed}`);
  await page.locator('#scale-pick').selectOption(String(scaleId));
  await expect.poll(() => page.getByTestId('stability').textContent(), { timeout: 10_000 }).toBe('Settled');
}

export async function liveCount(page: Page): Promise<number> {
  return Number(await page.getByTestId('live-count').getAttribute('data-count'));
}

// A capture waits on the server (and its mails when a variance is held): give it longer than a
// step that only changes the page before pressing again.
export const CAPTURE_WAIT_MS = 15_000;

/**
 * Does a step once the pan is settled, as an operator would, and presses again if the reading
 * moved at that moment (the page then says so and nothing happens).
 */
export async function whenSettled(page: Page, act: () => Promise<void>, done: () => Promise<boolean>, doneWithinMs = 2000): Promise<void> {
  const badge = page.getByTestId('stability');
  for (let attempt = 0; attempt < 6; attempt += 1) {
    await expect.poll(() => badge.textContent(), { timeout: 10_000 }).toBe('Settled');
    await act();
    try {
      await expect.poll(done, { timeout: doneWithinMs }).toBe(true);
      return;
    } catch {
      // moved just then: try again
    }
  }
  throw new Error('the step never took on a settled pan');
}

export const headingShown = (page: Page, name: string | RegExp) => () => page.getByRole('heading', { name }).isVisible();
