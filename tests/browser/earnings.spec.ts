import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoApi, launchChromium, screenshot, signInPage } from '../support/browser.js';
import { type RunningApp, startBuiltApp } from '../support/running-app.js';

const STYLIST = 'Rhea Castellane';

type Earnings = {
  staffName: string;
  missing: string[];
  branch: { currency: string };
  throughDate: string | null;
  figures: { serviceRevenue: string; serviceCommission: string; tips: string } | null;
  nextTier: { nextTier: unknown } | null;
  days: { date: string; serviceRevenue: string }[];
  statements: unknown[];
};

const addDays = (date: string, days: number) => new Date(Date.parse(`${date}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);
const businessDateIn = (timeZone: string) => new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(new Date());

/**
 * Issue 5: the demo stylist opens My earnings and reads her period so far, the way to the next tier and the
 * days as a chart. Where the demo holds no pay schedule yet, the owner sets one up first through the API.
 */
describe('a stylist opens My earnings', () => {
  let app: RunningApp;
  let browser: Browser;

  const { call: api, tokenOf } = demoApi(() => app.baseUrl);

  beforeAll(async () => {
    app = await startBuiltApp(3203, { LOGIN_THROTTLE_LIMIT: '1000' });
    browser = await launchChromium();
    const owner = await tokenOf('owner');
    const periods = (await api('/api/payroll/periods', owner)) as { schedule: unknown };
    if (periods.schedule) return;
    // A weekly schedule whose current period began six days ago at Riverside: the demo has closed every day before today.
    const staff = (await api('/api/staff', owner)) as { id: string; displayName: string; homeBranchId: string }[];
    const rhea = staff.find((s) => s.displayName === STYLIST)!;
    const branches = (await api('/api/branches', owner)) as { id: string; timeZone: string }[];
    const anchor = addDays(businessDateIn(branches.find((b) => b.id === rhea.homeBranchId)!.timeZone), -6);
    await api('/api/payroll/schedule', owner, { method: 'PUT', body: { frequency: 'weekly', anchorDate: anchor, workweekStartsOn: 0 } });
    // An invented plan; 35 % / 40 % / 45 % tiers are common practice in the trade.
    const plan = (await api('/api/payroll/plans', owner, {
      method: 'POST',
      body: {
        name: 'Browser check',
        terms: {
          effectiveFrom: anchor,
          tierMode: 'marginal',
          tiers: [
            { from: '0', rate: '0.35' },
            { from: '4000', rate: '0.40' },
            { from: '8000', rate: '0.45' },
          ],
          productCharge: { mode: 'actual-cost' },
          retailRate: '0.10',
        },
      },
    })) as { id: string };
    await api(`/api/payroll/plans/${plan.id}/assignments`, owner, { method: 'POST', body: { staffId: rhea.id, effectiveFrom: anchor } });
  });
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });

  const signIn = (who: string): Promise<Page> => signInPage(browser, app.baseUrl, who, { viewport: { width: 1366, height: 900 } });

  it('shows her figures, the way to the next tier, the chart of her days and her statements', async () => {
    const expected = (await api('/api/payroll/earnings/me', await tokenOf('stylist'))) as Earnings;
    expect(expected.missing).toEqual([]);
    expect(expected.days.length).toBeGreaterThan(0);
    const money = (value: string) => new Intl.NumberFormat('en-US', { style: 'currency', currency: expected.branch.currency }).format(value as Intl.StringNumericLiteral);

    const page = await signIn('stylist');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Earnings' }).click();
    await page.getByRole('heading', { name: 'Earnings', exact: true }).waitFor();
    const header = await page.locator('.tr-page-header').textContent();
    expect(header).toContain(STYLIST);
    expect(header).toMatch(/figures through \w{3}, \w{3} \d+, closed days only/);

    const figures = page.getByRole('table', { name: 'How the figures add up' });
    expect(await figures.getByRole('row', { name: /^Service revenue/ }).textContent()).toContain(money(expected.figures!.serviceRevenue));
    expect(await figures.getByRole('row', { name: /^Tips/ }).textContent()).toContain(money(expected.figures!.tips));
    expect(await page.getByRole('table', { name: 'Commission by tier' }).textContent()).toContain(money(expected.figures!.serviceCommission));

    const next = page.getByRole('region', { name: 'Next tier' });
    if (expected.nextTier?.nextTier) {
      expect(await next.textContent()).toMatch(/more service revenue, after the product charge, takes you to tier \d at [\d.]+ % and adds/);
      expect(await next.getByRole('progressbar').getAttribute('aria-valuetext')).toMatch(/% of the way from/);
    } else {
      expect(await next.textContent()).toContain('top tier');
    }

    // The chart draws a bar for each closed day with service revenue; the table under it holds every closed day in words.
    const days = page.getByRole('region', { name: 'Day by day' });
    const chart = days.getByRole('figure', { name: 'Service revenue per day' });
    await chart.locator('.recharts-bar-rectangle').first().waitFor();
    expect(await chart.locator('.recharts-bar-rectangle path').count()).toBe(expected.days.filter((d) => d.serviceRevenue !== '0.00').length);
    expect(await days.getByRole('table', { name: 'Figures per day' }).locator('tbody tr').count()).toBe(expected.days.length);
    expect(await page.getByRole('note', { name: 'About these figures' }).textContent()).toContain('payroll professional');

    if (expected.statements.length > 0) {
      const statements = page.getByRole('table', { name: 'Past statements' });
      expect(await statements.locator('tbody tr').count()).toBe(expected.statements.length);
      const [download] = await Promise.all([page.waitForEvent('download'), statements.getByRole('button', { name: /^Download the statement for/ }).first().click()]);
      expect(download.suggestedFilename()).toMatch(/^pay-statement-.+\.xlsx$/);
    } else {
      await page.getByText('No statements yet').waitFor();
    }
    await screenshot(page, '50-stylist-earnings');

    // Nobody else's figures: the front desk has no Earnings, and the page itself says so.
    const desk = await signIn('frontdesk');
    expect(await desk.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Earnings' }).count()).toBe(0);
    await desk.goto(`${app.baseUrl}/earnings`);
    await desk.getByText('Earnings are shown to staff members, for their own work.').waitFor();
    await desk.close();
    await page.close();
  });
});
