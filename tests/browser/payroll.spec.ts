import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoApi, launchChromium, screenshot, signInPage } from '../support/browser.js';
import { type RunningApp, startBuiltApp } from '../support/running-app.js';

const ORGANISATION = 'Thistlewick Hair Collective';

type Periods = { schedule: unknown; current: { startDate: string; endDate: string } | null; periods: { id: string; startDate: string; runStatus: string | null }[] };

const addDays = (date: string, days: number) => new Date(Date.parse(`${date}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);

/**
 * Issue 5: the accountant sets up the pay period holding today, runs it, watches the run's progress, approves it
 * and downloads the workbook. The demo's tickets are loaded without its payroll history (quicker to start), and
 * the owner sets the pay schedule and a plan up through the API first.
 */
describe('the accountant runs payroll in a real browser', () => {
  let app: RunningApp;
  let browser: Browser;
  const downloads = mkdtempSync(join(tmpdir(), 'tressury-payroll-'));

  const { call: api, tokenOf } = demoApi(() => app.baseUrl);

  beforeAll(async () => {
    app = await startBuiltApp(3205, { LOGIN_THROTTLE_LIMIT: '1000', TRESSURY_SEED_DEMO: 'tickets' });
    browser = await launchChromium();
    const owner = await tokenOf('owner');
    expect((await api<Periods>('/api/payroll/periods', owner)).schedule).toBeNull();
    // A fortnight whose last day is tomorrow, so it holds today; one invented plan (common-practice tiers) for everyone.
    const anchor = addDays(new Date().toISOString().slice(0, 10), -12);
    await api('/api/payroll/schedule', owner, { method: 'PUT', body: { frequency: 'biweekly', anchorDate: anchor, workweekStartsOn: 0 } });
    const plan = await api<{ id: string }>('/api/payroll/plans', owner, {
      method: 'POST',
      body: {
        name: 'House commission',
        terms: {
          effectiveFrom: anchor,
          tierMode: 'marginal',
          tiers: [
            { from: '0', rate: '0.40' },
            { from: '2500', rate: '0.45' },
          ],
          productCharge: { mode: 'actual-cost' },
          retailRate: '0.10',
        },
      },
    });
    for (const member of await api<{ id: string; active: boolean }[]>('/api/staff', owner)) {
      if (member.active) await api(`/api/payroll/plans/${plan.id}/assignments`, owner, { method: 'POST', body: { staffId: member.id, effectiveFrom: anchor } });
    }
  });
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
    rmSync(downloads, { recursive: true, force: true });
  });

  const signIn = (who: string): Promise<Page> => signInPage(browser, app.baseUrl, who, { viewport: { width: 1440, height: 1000 }, acceptDownloads: true });

  it('runs the current period, shows its progress, approves it and downloads a workbook that adds up', async () => {
    const page = await signIn('accountant');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Payroll' }).click();
    await page.getByRole('heading', { name: 'Payroll', exact: true }).waitFor();

    const { current } = await api<Periods>('/api/payroll/periods', await tokenOf('accountant'));
    expect(current).not.toBeNull();
    const { startDate, endDate } = current!;
    await page.getByText('Today’s pay period is not set up yet').waitFor();
    await page.getByRole('button', { name: /^Set up / }).click();
    await expect.poll(() => page.getByLabel('Pay period').locator('option:checked').textContent()).toMatch(/ · not run$/);
    await screenshot(page, '40-accountant-payroll-not-run');

    // Every state the run panel shows while computing, recorded as it happens: a poll can come back finished.
    await page.evaluate(() => {
      const seen: string[] = [];
      (window as unknown as { progressSeen: string[] }).progressSeen = seen;
      new MutationObserver(() => {
        const bar = document.querySelector('[aria-label="Payroll run progress"]');
        const text = bar?.getAttribute('aria-valuetext');
        if (text && seen.at(-1) !== text) seen.push(text);
      }).observe(document.body, { subtree: true, childList: true, attributes: true });
    });
    await page.getByRole('button', { name: 'Run payroll' }).click();
    await page.getByText('Draft', { exact: true }).waitFor({ timeout: 60_000 });
    const progress = await page.evaluate(() => (window as unknown as { progressSeen: string[] }).progressSeen);
    expect(progress.length).toBeGreaterThan(0);
    for (const state of progress) expect(state).toMatch(/^(Starting|\d+ of \d+ staff members)$/);
    expect(await page.getByRole('progressbar', { name: 'Payroll run progress' }).count()).toBe(0);

    const totals = page.getByLabel('Run totals');
    await totals.waitFor();
    const grossPay = (await totals.getByLabel('Gross pay', { exact: true }).textContent()) ?? '';
    expect(grossPay).toMatch(/^\d+\.\d\d$/);
    expect(await page.getByRole('note', { name: 'About these figures' }).first().textContent()).toContain('confirmed by a payroll professional');
    await screenshot(page, '41-accountant-payroll-draft');

    await page.getByRole('button', { name: 'Approve…' }).click();
    const confirm = page.getByRole('alertdialog');
    expect(await confirm.textContent()).toContain(`Approving freezes the figures`);
    expect(await confirm.textContent()).toContain(`(gross pay ${grossPay})`);
    await screenshot(page, '42-accountant-approve');
    await confirm.getByRole('button', { name: 'Approve and freeze' }).click();
    await page.getByText('Approved', { exact: true }).waitFor();
    expect(await page.getByRole('button', { name: 'Run again' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Approve…' }).count()).toBe(0);

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download workbook (.xlsx)' }).click()]);
    expect(download.suggestedFilename()).toBe(`${ORGANISATION.replaceAll(' ', '-')}-payroll-${startDate}-to-${endDate}.xlsx`);
    const file = join(downloads, download.suggestedFilename());
    await download.saveAs(file);
    await page.getByText('Approved and exported', { exact: true }).waitFor();
    await screenshot(page, '43-accountant-payroll-exported');

    // The workbook's Summary total (a SUM formula with its cached result) is the gross pay the review showed.
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.readFile(file);
    const summary = workbook.getWorksheet('Summary')!;
    const header = summary.getRow(4).values as unknown[];
    const grossColumn = header.indexOf('Gross pay');
    let total: ExcelJS.CellFormulaValue | undefined;
    summary.eachRow((row) => {
      if (row.getCell(1).value === 'Total') total = row.getCell(grossColumn).value as ExcelJS.CellFormulaValue;
    });
    expect(total?.formula).toMatch(/^SUM\(/);
    expect(Number(total?.result).toFixed(2)).toBe(grossPay);
    await page.close();
  });
});
