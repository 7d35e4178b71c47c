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
  await page
    .getByRole('region', { name: /Practice pan/ })
    .getByRole('button', { name })
    .click();
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

/**
 * A keyboard-wedge scan as the hardware sends it: each key stamped 8 ms after the last, then Enter.
 * A real scanner's keys carry the operating system's timestamps, so a busy page still sees them
 * 8 ms apart; Playwright's own typing stamps each key when the page gets round to it, which on a
 * loaded test machine can be 100 ms, and would test the machine rather than the bench.
 */
export async function wedgeScan(page: Page, code: string): Promise<void> {
  const cdp = await page.context().newCDPSession(page);
  const start = Date.now() / 1000;
  const keys = [...code].map((ch) => ({ key: ch, text: ch }));
  keys.push({ key: 'Enter', text: '\r' });
  for (const [i, k] of keys.entries()) {
    const timestamp = start + i * 0.008;
    const enter = k.key === 'Enter' ? { code: 'Enter', windowsVirtualKeyCode: 13, nativeVirtualKeyCode: 13 } : {};
    await cdp.send('Input.dispatchKeyEvent', { type: 'keyDown', key: k.key, text: k.text, unmodifiedText: k.text, timestamp, ...enter });
    await cdp.send('Input.dispatchKeyEvent', { type: 'keyUp', key: k.key, timestamp: timestamp + 0.002, ...enter });
  }
  await cdp.detach();
}
