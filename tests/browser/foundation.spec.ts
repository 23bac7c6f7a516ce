import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchChromium, screenshot, signInPage } from '../support/browser.js';
import { type RunningApp, startBuiltApp } from '../support/running-app.js';


describe('foundation in a real browser', () => {
  let app: RunningApp;
  let browser: Browser;

  beforeAll(async () => {
    app = await startBuiltApp(3190);
    browser = await launchChromium();
  });
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  const signIn = (email: string): Promise<Page> => signInPage(browser, app.baseUrl, email, { viewport: { width: 1280, height: 800 } });

  it('shows the sign-in page and refuses a wrong password with a message', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
    await page.goto(app.baseUrl);
    await screenshot(page, '01-sign-in');
    await page.getByLabel('E-mail').fill('owner@thistlewick.example');
    await page.getByLabel('Password').fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect.poll(() => page.getByText('The e-mail or password is not right.').count()).toBeGreaterThan(0);
    await page.close();
  });

  it('the owner creates a branch and sees it in the table', async () => {
    const page = await signIn('owner@thistlewick.example');
    await screenshot(page, '02-owner-overview');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Branches' }).click();
    const table = page.getByRole('table', { name: 'Branches' });
    await table.getByRole('cell', { name: 'Riverside', exact: true }).waitFor();
    await screenshot(page, '03-owner-branches');

    await page.getByRole('button', { name: 'New branch' }).click();
    await page.getByLabel('Name').fill('Lantern Quay');
    await page.getByLabel('Time zone').selectOption('America/Los_Angeles');
    await screenshot(page, '04-owner-new-branch');
    await page.getByRole('button', { name: 'Create branch' }).click();
    await table.getByRole('cell', { name: 'Lantern Quay', exact: true }).waitFor();
    await screenshot(page, '05-owner-branch-created');

    // Persisted on the server, not only in the page: a reload still lists it.
    await page.reload();
    await page.getByRole('table', { name: 'Branches' }).getByRole('cell', { name: 'Lantern Quay', exact: true }).waitFor();
    await page.close();
  });

  it('a stylist finds no branch administration in the navigation', async () => {
    const page = await signIn('stylist@thistlewick.example');
    const nav = page.getByRole('navigation', { name: 'Main' });
    await expect.poll(() => nav.getByRole('link', { name: 'Overview' }).count()).toBe(1);
    expect(await nav.getByRole('link', { name: 'Branches' }).count()).toBe(0);
    await screenshot(page, '06-stylist-overview');
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    await page.close();
  });

  it('every demo role can sign in and reach the overview', async () => {
    for (const who of ['manager', 'frontdesk', 'accountant']) {
      const page = await signIn(`${who}@thistlewick.example`);
      await screenshot(page, `07-${who}-overview`);
      await page.close();
    }
  });
});
