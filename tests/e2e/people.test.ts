import type { BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createUser, unique } from '../helpers/db';
import { openBrowser, screenshot, signInThroughPage } from '../helpers/browser';
import { waitForMail } from '../helpers/mail';

describe('people (browser)', () => {
  let admin: BrowserContext;
  let newcomer: BrowserContext;
  beforeAll(async () => {
    admin = await openBrowser();
    newcomer = await openBrowser({ width: 800, height: 1280 });
  });
  afterAll(async () => {
    await admin.close();
    await newcomer.close();
  });

  it('an admin invites a clerk, who follows the e-mailed link, chooses a password and lands on Today', async () => {
    const page = await admin.newPage();
    await signInThroughPage(page, 'admin');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'People' }).click();
    await page.waitForURL('**/admin/users');
    const email = `${unique('rosa')}@example.test`;
    const form = page.getByRole('form', { name: 'Invite someone' });
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await expect.poll(() => form.getByText('Name is required').isVisible()).toBe(true);
    await form.getByLabel('Name').fill('Rosa Lindqvist');
    await form.getByLabel('E-mail').fill(email);
    await form.getByLabel('Role').selectOption('clerk');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await expect.poll(() => page.getByTestId('people-notice').textContent()).toContain(`Invitation sent to ${email}`);
    // Many people exist by now: narrow the list as a user would, then look for the new row.
    await page.getByLabel('Find').fill(email);
    await expect.poll(() => page.getByRole('gridcell', { name: email }).count()).toBe(1);
    await screenshot(page, 'people-invited');

    const [mail] = await waitForMail(email);
    const link = mail.text.match(/https?:\/\/\S+\/set-password\?token=\S+/)![0];
    const tab = await newcomer.newPage();
    await tab.goto(link);
    await tab.getByLabel('New password').fill('my own long secret');
    await tab.getByLabel('Same password again').fill('my own long secret');
    await screenshot(tab, 'set-password-tablet');
    await tab.getByRole('button', { name: 'Save and sign in' }).click();
    await tab.waitForURL((url) => url.pathname === '/');
    expect(await tab.getByRole('main').getByText('Stockroom clerk').first().isVisible()).toBe(true);
    await screenshot(tab, 'today-clerk-tablet');

    // Switching someone off asks first, saying what it does; keeping it as it is changes nothing.
    await page.getByRole('button', { name: 'Switch off' }).click();
    const ask = page.getByRole('alertdialog', { name: 'Please confirm' });
    await expect.poll(() => ask.textContent()).toContain('Switch off Rosa Lindqvist? They can no longer sign in');
    await ask.getByRole('button', { name: 'Keep it as it is' }).click();
    expect(await ask.count()).toBe(0);
    // Setting her password changed her record since the list was read: nothing is saved, the list
    // shows her as she is now, and the change made again goes through.
    await page.getByRole('button', { name: 'Switch off' }).click();
    await ask.getByRole('button', { name: 'Yes, switch off' }).click();
    await expect.poll(() => page.getByTestId('people-notice').textContent()).toContain('was changed meanwhile, so nothing was saved');
    await expect.poll(() => page.getByRole('gridcell', { name: 'active', exact: true }).count()).toBe(1);
    await page.getByRole('button', { name: 'Switch off' }).click();
    await ask.getByRole('button', { name: 'Yes, switch off' }).click();
    await expect.poll(() => page.getByTestId('people-notice').textContent()).toBe('Rosa Lindqvist: saved.');
    await expect.poll(() => page.getByRole('gridcell', { name: 'inactive' }).count()).toBe(1);
  });

  it('an admin mails someone a password reset link; the outbox shows it masked, and only the person can use it', async () => {
    const person = await createUser('operator');
    const page = await admin.newPage();
    await signInThroughPage(page, 'admin');
    await page.goto('/admin/users');
    await page.getByLabel('Find').fill(person.email);
    await expect.poll(() => page.getByRole('gridcell', { name: person.email }).count()).toBe(1);
    await page.getByRole('button', { name: 'Reset password' }).click();
    const ask = page.getByRole('alertdialog', { name: 'Please confirm' });
    await expect.poll(() => ask.textContent()).toContain('Their current password keeps working until they use it');
    await ask.getByRole('button', { name: 'Yes, send the link' }).click();
    await expect.poll(() => page.getByTestId('people-notice').textContent()).toBe(`A password reset link went to ${person.email}; only they can open it.`);

    const [mail] = await waitForMail(person.email);
    const link = mail.text.match(/https?:\/\/\S+\/set-password\?token=\S+/)![0];
    await page.goto('/admin/mail');
    const entry = page.getByRole('listitem').filter({ hasText: person.email }).first();
    await entry.getByText('Choose a new Tallyforge password').click();
    await expect.poll(() => entry.locator('pre').textContent()).toContain('[one-time link: only the recipient has it]');
    expect(await entry.locator('pre').textContent()).not.toContain('token=');
    await screenshot(page, 'outbox-masked-link');

    const tab = await newcomer.newPage();
    await tab.goto(link);
    await tab.getByLabel('New password').fill('a fresh long secret');
    await tab.getByLabel('Same password again').fill('a fresh long secret');
    await tab.getByRole('button', { name: 'Save and sign in' }).click();
    await tab.waitForURL((url) => url.pathname === '/');
  });
});
