import type { QueryClient } from '@tanstack/react-query';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { routePaths } from '../../../lib/route-paths';
import { fakeApi, json, problem } from '../../../test/fake-api';
import { stylistMe } from '../../../test/sessions';
import { openPage } from '../../../test/test-page';
import { earnings, linkedStylistMe, statement } from '../earnings-test-data';
import { EarningsRoute, earningsLoader } from './earnings.route';

const routes = (queryClient: QueryClient) => [{ path: routePaths.earnings, loader: earningsLoader(queryClient), Component: EarningsRoute }];
const rowTexts = (table: HTMLElement) => within(table).getAllByRole('row').map((row) => [...row.querySelectorAll('th, td')].map((cell) => cell.textContent?.trim()));

describe('My earnings', () => {
  it('shows the period so far, the tiers, the way to the next tier and the days, in the branch currency', async () => {
    const api = fakeApi({ 'GET /api/payroll/earnings/me': json(200, earnings) });
    openPage(linkedStylistMe, routePaths.earnings, routes);

    expect(await screen.findByRole('heading', { name: 'Earnings' })).toBeTruthy();
    expect(screen.getByText(/pay period Mar 2 – Mar 8, 2026 · figures through Wed, Mar 4, closed days only/)).toBeTruthy();
    expect(api.calls('GET /api/payroll/earnings/me')[0]!.authorization).toBe('Bearer token-for-stylist');

    expect(rowTexts(screen.getByRole('table', { name: 'How the figures add up' }))).toEqual([
      ['Service revenue', '$248.00'],
      ['Less product charge (colour used on your services)', '$24.20'],
      ['Commissionable revenue', '$223.80'],
      ['Service commission (by tier, below)', '$79.52'],
      ['Retail sales', '$24.00'],
      ['Retail commission at 10 %', '$2.40'],
      ['Tips', '$25.00'],
    ]);
    const tiers = rowTexts(screen.getByRole('table', { name: 'Commission by tier' }));
    expect(tiers.slice(1)).toEqual([
      ['Tier 1', '$0.00', '$200.00', '35 %', '$200.00', '$70.00'],
      ['Tier 2 you are here', '$200.00', '$400.00', '40 %', '$23.80', '$9.52'],
      ['Tier 3', '$400.00', 'and above', '45 %', '$0.00', '$0.00'],
      ['Total', '$223.80', '$79.52'],
    ]);

    const next = screen.getByRole('region', { name: 'Next tier' });
    expect(next.textContent).toContain('$176.20 more service revenue, after the product charge, takes you to tier 3 at 45 % and adds $70.48 to your commission.');
    const bar = within(next).getByRole('progressbar', { name: 'Progress from tier 2 to tier 3' });
    expect(bar.getAttribute('aria-valuetext')).toBe('11 % of the way from $200.00 to $400.00');
    expect(next.textContent).not.toContain('whole period');

    const days = screen.getByRole('region', { name: 'Day by day' });
    expect(within(days).getByRole('figure', { name: 'Service revenue per day' })).toBeTruthy();
    expect(days.textContent).toContain('Service revenue on 2 of 3 days so far; the best was Tue, Mar 3 with $178.00.');
    expect(rowTexts(within(days).getByRole('table', { name: 'Figures per day' })).slice(1)).toEqual([
      ['Mon, Mar 2', '$0.00', '$0.00', '$0.00', '$0.00'],
      ['Tue, Mar 3', '$178.00', '$13.20', '$24.00', '$15.00'],
      ['Wed, Mar 4', '$70.00', '$11.00', '$0.00', '$10.00'],
    ]);
    expect(screen.getByRole('note', { name: 'About these figures' }).textContent).toMatch(/confirmed by a payroll professional/);
    expect(rowTexts(screen.getByRole('table', { name: 'Past statements' })).slice(1)).toEqual([
      ['Feb 23 – Mar 1, 2026', 'Approved, exported to the payroll workbook', '$1,184.37', 'Statement (.xlsx)'],
    ]);
  });

  it('uses the currency of the branch and explains the whole-period lift', async () => {
    fakeApi({
      'GET /api/payroll/earnings/me': json(200, {
        ...earnings,
        branch: { ...earnings.branch, currency: 'GBP' },
        plan: { ...earnings.plan!, tierMode: 'whole-period' },
        nextTier: { ...earnings.nextTier!, commissionAdded: '113.89' },
      }),
    });
    openPage(linkedStylistMe, routePaths.earnings, routes);
    const next = await screen.findByRole('region', { name: 'Next tier' });
    expect(next.textContent).toContain('£176.20 more service revenue');
    expect(next.textContent).toContain('adds £113.89 to your commission');
    expect(next.textContent).toContain('once you reach £400.00, the whole period is paid at 45 %');
    expect(screen.getByText(/pays all of the period’s commissionable revenue at the rate of the highest tier/)).toBeTruthy();
  });

  it('says so on the top tier', async () => {
    fakeApi({
      'GET /api/payroll/earnings/me': json(200, {
        ...earnings,
        nextTier: { currentTier: { index: 2, from: '400.00', to: null, rate: '0.45' }, nextTier: null, revenueToNextTier: null, commissionAtNextTier: null, commissionAdded: null, progress: '1' },
      }),
    });
    openPage(linkedStylistMe, routePaths.earnings, routes);
    const next = await screen.findByRole('region', { name: 'Next tier' });
    expect(next.textContent).toContain('You have reached your plan’s top tier (Tier 3 at 45 %)');
    expect(within(next).queryByRole('progressbar')).toBeNull();
  });

  it('says what is missing instead of figures, and still lists the statements', async () => {
    fakeApi({ 'GET /api/payroll/earnings/me': json(200, { ...earnings, missing: ['pay_plan'], plan: null, figures: null, nextTier: null, days: [] }) });
    openPage(linkedStylistMe, routePaths.earnings, routes);
    expect(await screen.findByText('No pay plan for this pay period')).toBeTruthy();
    expect(screen.queryByRole('table', { name: 'Commission by tier' })).toBeNull();
    expect(screen.getByRole('table', { name: 'Past statements' })).toBeTruthy();
  });

  it('shows no statements yet, and no schedule', async () => {
    fakeApi({ 'GET /api/payroll/earnings/me': json(200, { ...earnings, missing: ['pay_schedule'], period: null, throughDate: null, plan: null, figures: null, nextTier: null, days: [], statements: [] }) });
    openPage(linkedStylistMe, routePaths.earnings, routes);
    expect(await screen.findByText('No pay schedule yet')).toBeTruthy();
    expect(screen.getByText('No statements yet')).toBeTruthy();
  });

  it('downloads a statement with the signed-in token under the name the server gives it', async () => {
    const name = 'Pay statement Oren Vale 2026-02-23 to 2026-03-01.xlsx';
    const path = `/api/payroll/runs/${statement.runId}/lines/${statement.lineId}/statement.xlsx`;
    fakeApi({
      'GET /api/payroll/earnings/me': json(200, earnings),
      [`GET ${path}`]: (request) => {
        expect(request.headers.get('Authorization')).toBe('Bearer token-for-stylist');
        return new Response(new Blob(['PK']), { status: 200, headers: { 'Content-Disposition': `attachment; filename="s.xlsx"; filename*=UTF-8''${encodeURIComponent(name)}` } });
      },
    });
    const saved: string[] = [];
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      saved.push(this.download);
    });
    const { user } = openPage(linkedStylistMe, routePaths.earnings, routes);
    await user.click(await screen.findByRole('button', { name: 'Download the statement for Feb 23 – Mar 1, 2026 (.xlsx)' }));
    await waitFor(() => expect(saved).toEqual([name]));
    vi.restoreAllMocks();
  });

  it('shows the server’s refusal of a download', async () => {
    fakeApi({
      'GET /api/payroll/earnings/me': json(200, earnings),
      [`GET /api/payroll/runs/${statement.runId}/lines/${statement.lineId}/statement.xlsx`]: problem(404, 'payroll_line.not_found', 'No such payroll line.'),
    });
    const { user } = openPage(linkedStylistMe, routePaths.earnings, routes);
    await user.click(await screen.findByRole('button', { name: /Download the statement/ }));
    expect(await screen.findByText('No such payroll line.')).toBeTruthy();
  });

  it('is not there for a sign-in without a staff record', async () => {
    const api = fakeApi({});
    openPage(stylistMe, routePaths.earnings, routes);
    expect(await screen.findByText('Earnings are shown to staff members, for their own work.')).toBeTruthy();
    expect(api.seen).toEqual([]);
  });
});
