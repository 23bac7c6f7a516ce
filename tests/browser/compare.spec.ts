import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchChromium, screenshot, signInPage } from '../support/browser.js';
import { type RunningApp, startBuiltApp } from '../support/running-app.js';

// The demo group's four branches; the manager runs Old Mill and Riverside.
const EVERY_BRANCH = ['Harbor Point', 'Juniper Flats', 'Old Mill', 'Riverside'];
const MANAGERS_BRANCHES = ['Old Mill', 'Riverside'];
// Riverside's senior stylist in the demo.
const STYLIST = 'Rhea Castellane';

/**
 * Issue 6 in a browser: the owner compares every branch, moves the range with a preset, drills into one
 * branch's days and stylists and takes the table away as a workbook; a manager sees only their branches.
 */
describe('comparing branches in a real browser', () => {
  let app: RunningApp;
  let browser: Browser;

  // The full demo builds its comparison read models before the app listens: that can take minutes on a busy machine.
  beforeAll(async () => {
    app = await startBuiltApp(3207, { LOGIN_THROTTLE_LIMIT: '1000' });
    browser = await launchChromium();
  }, 240_000);
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  const signIn = (who: string): Promise<Page> => signInPage(browser, app.baseUrl, who, { viewport: { width: 1440, height: 900 } });

  /** The branch names down the comparison table, the totals row last. */
  async function tableBranches(page: Page): Promise<string[]> {
    const table = page.getByRole('region', { name: 'Branch figures' });
    await table.locator('.tr-compare-totals').first().waitFor();
    const names = await table.locator('.tr-compare-name').allTextContents();
    return [...new Set(names)];
  }

  async function openCompare(page: Page): Promise<void> {
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Compare' }).click();
    await page.getByRole('heading', { name: 'Compare branches' }).waitFor();
  }

  it('the owner compares every branch, changes the range with a preset and drills into one', async () => {
    const page = await signIn('owner');
    await openCompare(page);
    expect(await tableBranches(page)).toEqual([...EVERY_BRANCH, 'All branches']);
    expect(page.url()).toMatch(/\/compare$/);
    await page.getByRole('heading', { name: 'Revenue per week' }).waitFor();
    await screenshot(page, '60-compare-owner-90-days');

    // The demo pays fortnightly: the last pay period is the fortnight before the one holding today.
    await page.getByRole('button', { name: 'Last pay period' }).click();
    await expect.poll(() => new URL(page.url()).searchParams.get('from')).not.toBeNull();
    const search = new URL(page.url()).searchParams;
    const days = (Date.parse(search.get('to') ?? '') - Date.parse(search.get('from') ?? '')) / 86_400_000 + 1;
    expect(days).toBe(14);
    await page.getByText(/· 14 days$/).waitFor();
    expect(await page.getByRole('button', { name: 'Last pay period' }).getAttribute('aria-pressed')).toBe('true');
    // Fourteen days are drawn day by day, and every branch is still there.
    await page.getByRole('heading', { name: 'Revenue per day' }).waitFor();
    expect(await tableBranches(page)).toEqual([...EVERY_BRANCH, 'All branches']);
    await screenshot(page, '61-compare-owner-last-pay-period');

    // The table as a workbook, under the name the server gives it.
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download XLSX' }).click()]);
    expect(download.suggestedFilename()).toMatch(/\.xlsx$/);

    // Drill into Riverside: its days and its stylists over the same fortnight.
    await page.getByRole('link', { name: 'Riverside: days and stylists' }).click();
    await page.getByRole('heading', { name: 'Riverside', level: 1 }).waitFor();
    expect(new URL(page.url()).searchParams.get('from')).toBe(search.get('from'));
    expect(new URL(page.url()).searchParams.get('to')).toBe(search.get('to'));
    const dayRows = page.getByRole('table', { name: 'Days' }).getByRole('row');
    await expect.poll(() => dayRows.count()).toBe(15);
    await page.getByRole('table', { name: 'Stylists' }).getByRole('rowheader', { name: STYLIST }).waitFor();
    await page.getByRole('heading', { name: 'Revenue per day at Riverside' }).waitFor();
    await screenshot(page, '62-compare-riverside-days-and-stylists');

    await page.getByRole('link', { name: 'All branches' }).click();
    await page.getByRole('heading', { name: 'Compare branches' }).waitFor();
    expect(new URL(page.url()).searchParams.get('from')).toBe(search.get('from'));
    await page.close();
  });

  it('the owner reads each branch’s monthly franchise fees', async () => {
    const page = await signIn('owner');
    await openCompare(page);
    await page.getByRole('link', { name: 'Franchise fees' }).click();
    await page.getByRole('heading', { name: 'Franchise fees' }).waitFor();
    for (const branch of EVERY_BRANCH) {
      const statement = page.getByRole('table', { name: new RegExp(`^Fees of ${branch}, `) });
      await statement.waitFor();
      expect(await statement.getByRole('row').count()).toBe(5);
    }
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Download the Riverside statement (XLSX)' }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/\.xlsx$/);
    await screenshot(page, '63-compare-fees');
    await page.close();
  });

  it('a manager compares only the branches they run', async () => {
    const page = await signIn('manager');
    await openCompare(page);
    expect(await tableBranches(page)).toEqual([...MANAGERS_BRANCHES, 'All branches']);
    expect(await page.getByText('Harbor Point').count()).toBe(0);
    await screenshot(page, '64-compare-manager');
    await page.close();
  });
});
