import { Classes } from '@blueprintjs/core';
import type { QueryClient } from '@tanstack/react-query';
import { screen, waitFor, within } from '@testing-library/react';
import Decimal from 'decimal.js';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { routePaths } from '../../../lib/route-paths';
import { fakeApi, json, problem } from '../../../test/fake-api';
import { openPage } from '../../../test/test-page';
import { moneyColumns } from '../components/review-figures';
import { lines, periodsWith, run, runAccountantMe, runId, runManagerMe, wrenDetail } from '../components/run-test-data';
import { PayrollRoute, payrollLoader } from './payroll.route';

const routes = (queryClient: QueryClient) => [{ path: routePaths.payroll, loader: payrollLoader(queryClient), Component: PayrollRoute }];

const runPath = `/api/payroll/runs/${runId}`;

// happy-dom lays nothing out, so Table2 would see a 0×0 viewport and render only its first columns: give every
// element the size of a wide screen while these tests run.
const sized = ['clientWidth', 'clientHeight'] as const;
beforeAll(() => {
  for (const name of sized) Object.defineProperty(HTMLElement.prototype, name, { configurable: true, get: () => (name === 'clientWidth' ? 2400 : 900) });
});
afterAll(() => {
  for (const name of sized) delete (HTMLElement.prototype as unknown as Record<string, unknown>)[name];
});

// @blueprintjs/table exports no class names; its classes share core's namespace.
const ns = Classes.getClassNamespace();

/** The text of every rendered cell in the grid's column, by the column's position. */
function columnTexts(column: number): string[] {
  // The frozen name column is drawn in the left quadrant, the others in the main one.
  const quadrant = column === 0 ? 'left' : 'main';
  return [...document.querySelectorAll(`.${ns}-table-quadrant-${quadrant} .${ns}-table-cell-col-${column}`)]
    .filter((cell) => !cell.classList.contains(`${ns}-table-header`))
    .map((cell) => cell.textContent ?? '');
}

describe('Payroll: run and review', () => {
  it('shows the progress while the run computes, then the review grid', async () => {
    const api = fakeApi({
      'GET /api/payroll/periods': [json(200, periodsWith(null)), json(200, periodsWith('computing')), json(200, periodsWith('draft'))],
      'POST /api/payroll/periods/e710d000-0000-4000-8000-000000000001/runs': json(202, run({ status: 'computing', totalStaff: 3, processedStaff: 0, completedAt: null })),
      [`GET ${runPath}`]: [
        json(200, run({ status: 'computing', processedStaff: 1, completedAt: null })),
        json(200, run({ status: 'computing', processedStaff: 2, completedAt: null })),
        json(200, run()),
      ],
      [`GET ${runPath}/lines`]: json(200, lines),
    });
    const { user } = openPage(runAccountantMe, routePaths.payroll, routes);

    await user.click(await screen.findByRole('button', { name: 'Run payroll' }));
    await screen.findByText(/Computing:/);
    const bar = screen.getByRole('progressbar', { name: 'Payroll run progress' });
    expect(bar.getAttribute('aria-valuetext')).toMatch(/^[0-2] of 3 staff members$/);
    // Polled every 700 ms until the run leaves "computing".
    await waitFor(() => expect(screen.getByRole('progressbar').getAttribute('aria-valuetext')).toBe('2 of 3 staff members'), { timeout: 5000 });
    expect(screen.getByText(/Computing:/).textContent).toBe('Computing: 2 of 3 staff members done.');
    await screen.findByText('Draft', {}, { timeout: 5000 });
    expect(screen.queryByRole('progressbar')).toBeNull();
    expect(api.calls(`GET ${runPath}`).length).toBeGreaterThanOrEqual(3);
    await screen.findByRole('button', { name: 'Wren Halloway: open the figures' });
    expect(screen.getByRole('button', { name: 'Approve…' })).toBeTruthy();
    expect(screen.getByRole('note', { name: 'About these figures' }).textContent).toContain('confirmed by a payroll professional');
  });

  it('says plainly why a run failed and offers to start again', async () => {
    fakeApi({
      'GET /api/payroll/periods': json(200, periodsWith('failed')),
      [`GET ${runPath}`]: json(200, run({ status: 'failed', error: 'Wren Halloway has no pay plan for 2026-03-01.', completedAt: null })),
    });
    openPage(runAccountantMe, routePaths.payroll, routes);
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('The run did not finish');
    expect(alert.textContent).toContain('Wren Halloway has no pay plan for 2026-03-01.');
    expect(within(alert).getByRole('button', { name: 'Start again' })).toBeTruthy();
  });

  it('says when a computing run has stalled, with no progress bar, and starts it again', async () => {
    const api = fakeApi({
      'GET /api/payroll/periods': json(200, periodsWith('computing')),
      [`GET ${runPath}`]: json(200, run({ status: 'computing', processedStaff: 1, completedAt: null, stalled: true })),
      'POST /api/payroll/periods/e710d000-0000-4000-8000-000000000001/runs': json(202, run({ status: 'computing', processedStaff: 0, completedAt: null })),
    });
    const { user } = openPage(runAccountantMe, routePaths.payroll, routes);
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('This run has stalled — start again');
    expect(screen.queryByRole('progressbar')).toBeNull();
    await user.click(within(alert).getByRole('button', { name: 'Start again' }));
    await waitFor(() => expect(api.calls('POST /api/payroll/periods/e710d000-0000-4000-8000-000000000001/runs')).toHaveLength(1));
  });

  it('approves after a confirmation that says it freezes the figures; the run buttons are gone afterwards', async () => {
    const api = fakeApi({
      'GET /api/payroll/periods': [json(200, periodsWith('draft')), json(200, periodsWith('approved'))],
      [`GET ${runPath}`]: json(200, run()),
      [`GET ${runPath}/lines`]: json(200, lines),
      [`POST ${runPath}/approve`]: json(200, run({ status: 'approved', approvedAt: '2026-03-16T15:00:00.000Z' })),
    });
    const { user } = openPage(runAccountantMe, routePaths.payroll, routes);

    await user.click(await screen.findByRole('button', { name: 'Approve…' }));
    const dialog = await screen.findByRole('alertdialog');
    expect(dialog.textContent).toContain('freezes the figures of all 3 staff');
    expect(dialog.textContent).toContain('(gross pay 2737.49)');
    expect(api.calls(`POST ${runPath}/approve`)).toHaveLength(0);
    await user.click(within(dialog).getByRole('button', { name: 'Approve and freeze' }));

    await screen.findByText('Approved');
    expect(api.calls(`POST ${runPath}/approve`)).toHaveLength(1);
    expect(screen.getByText(/The figures are frozen/)).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Approve…' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Run again' })).toBeNull();
    expect(screen.getByRole('button', { name: 'Download workbook (.xlsx)' })).toBeTruthy();
  });

  it('shows each flag as an icon with its words, and a totals row that is the sum of the rows', async () => {
    fakeApi({
      'GET /api/payroll/periods': json(200, periodsWith('draft')),
      [`GET ${runPath}`]: json(200, run()),
      [`GET ${runPath}/lines`]: json(200, lines),
    });
    openPage(runAccountantMe, routePaths.payroll, routes);
    await screen.findByRole('button', { name: 'Wren Halloway: open the figures' });

    const flags = columnTexts(3 + moneyColumns.length);
    expect(flags).toEqual(['Overtime', 'Top-up', 'Top-upNegative commission', '3 flagged']);
    expect(screen.getAllByText('Top-up')[0]?.closest(`.${Classes.TAG}`)?.querySelector('svg')).toBeTruthy();

    // Every money column's last cell against decimal.js (an independent decimal library) adding the rows.
    moneyColumns.forEach(({ key }, i) => {
      const cells = columnTexts(3 + i);
      const expected = lines.reduce((total, line) => total.plus(line[key]), new Decimal(0)).toFixed(2);
      expect(cells).toEqual([...lines.map((line) => line[key]), expected]);
    });
    expect(columnTexts(3 + moneyColumns.length - 1).at(-1)).toBe('2737.49');
    expect(columnTexts(2)).toEqual(['86.5', '61.25', '12.125', '159.875']);
    expect(columnTexts(0).at(-1)).toBe('Total · 3 staff');
  });

  it('sorts from a column header and keeps the totals row last', async () => {
    fakeApi({
      'GET /api/payroll/periods': json(200, periodsWith('draft')),
      [`GET ${runPath}`]: json(200, run()),
      [`GET ${runPath}/lines`]: json(200, lines),
    });
    const { user } = openPage(runAccountantMe, routePaths.payroll, routes);
    await screen.findByRole('button', { name: 'Wren Halloway: open the figures' });
    const grossColumn = 3 + moneyColumns.findIndex((c) => c.key === 'grossPay');

    // The header row is drawn twice (scrolling and fixed quadrants); either copy sorts.
    await user.click(screen.getAllByRole('button', { name: 'Sort by Gross pay' })[0]!);
    await waitFor(() => expect(columnTexts(grossColumn)).toEqual(['87.91', '498.06', '2151.52', '2737.49']));
    await user.click(screen.getAllByRole('button', { name: 'Sort by Gross pay, now ascending' })[0]!);
    await waitFor(() => expect(columnTexts(grossColumn)).toEqual(['2151.52', '498.06', '87.91', '2737.49']));
    expect(columnTexts(0)).toEqual(['Wren Halloway', 'Tamsin Greaves', 'Ottoline Brask', 'Total · 3 staff']);
  });

  it('opens a staff member’s lines, tiers and workweeks in a drawer', async () => {
    fakeApi({
      'GET /api/payroll/periods': json(200, periodsWith('draft')),
      [`GET ${runPath}`]: json(200, run()),
      [`GET ${runPath}/lines`]: json(200, lines),
      [`GET ${runPath}/lines/${lines[0]!.id}`]: json(200, wrenDetail),
    });
    const { user } = openPage(runAccountantMe, routePaths.payroll, routes);
    await user.click(await screen.findByRole('button', { name: 'Wren Halloway: open the figures' }));

    const drawer = await screen.findByRole('region', { name: 'Figures for Wren Halloway' });
    const tiers = await within(drawer).findByRole('table', { name: 'Commission tiers' });
    expect(within(tiers).getAllByRole('row').map((row) => row.textContent)).toEqual([
      'FromUp toRateRevenue in bandCommission',
      '0300040 %3000.001200.00',
      '3000and above45 %891.55401.20',
      'Commissionable revenue and service commission3891.551656.20',
    ]);
    const weeks = within(drawer).getByRole('table', { name: 'Workweeks' });
    expect(within(weeks).getAllByRole('row')[1]?.textContent).toContain('46.5932.4020.050.006.565.17Applies');
    expect(within(drawer).getByRole('table', { name: 'Service lines' }).textContent).toContain('Colour service185.0021.40100 %');
    expect(within(drawer).getByRole('table', { name: 'Product charge adjustments' }).textContent).toContain('3.40');
    expect(within(drawer).getByRole('table', { name: 'Retail lines' }).textContent).toContain('42.00');
    expect(within(drawer).getByRole('table', { name: 'Tips' }).textContent).toContain('30.00');
    expect(within(drawer).getByText(/Product charge: The colour product's cost plus 10 %/)).toBeTruthy();
    expect(within(drawer).getByRole('note', { name: 'About these figures' })).toBeTruthy();
  });

  it('downloads the workbook under the name the server gives it', async () => {
    const workbook = new Blob(['PK'], { type: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet' });
    const name = 'Fernhollow Hair Studios payroll 2026-03-01 to 2026-03-14.xlsx';
    fakeApi({
      'GET /api/payroll/periods': json(200, periodsWith('approved')),
      [`GET ${runPath}`]: json(200, run({ status: 'approved', approvedAt: '2026-03-16T15:00:00.000Z' })),
      [`GET ${runPath}/lines`]: json(200, lines),
      [`GET ${runPath}/workbook`]: (request) => {
        expect(request.headers.get('Authorization')).toBe('Bearer token-for-accountant');
        return new Response(workbook, { status: 200, headers: { 'Content-Disposition': `attachment; filename="x.xlsx"; filename*=UTF-8''${encodeURIComponent(name)}` } });
      },
    });
    const saved: string[] = [];
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      saved.push(this.download);
    });
    const { user } = openPage(runAccountantMe, routePaths.payroll, routes);
    await user.click(await screen.findByRole('button', { name: 'Download workbook (.xlsx)' }));
    await waitFor(() => expect(saved).toEqual([name]));
    vi.restoreAllMocks();
  });

  it('sends an approved run’s statements after asking, and says how many went and which failed', async () => {
    const message = (n: number, staffId: string, status: 'sent' | 'failed', error: string | null) => ({
      id: `0e000000-0000-4000-8000-00000000000${n}`,
      kind: 'pay_statement',
      recipient: status === 'sent' ? `person${n}@example.test` : '',
      recipientStaffId: staffId,
      subject: 'Your pay statement',
      textBody: '',
      attachmentName: null,
      subjectRef: `payroll_run:${runId}`,
      status,
      error,
      createdAt: '2026-03-16T15:10:00.000Z',
    });
    const api = fakeApi({
      'GET /api/payroll/periods': json(200, periodsWith('approved')),
      [`GET ${runPath}`]: json(200, run({ status: 'approved', approvedAt: '2026-03-16T15:00:00.000Z' })),
      [`GET ${runPath}/lines`]: json(200, lines),
      [`POST ${runPath}/statements`]: json(200, {
        sent: 2,
        failed: 1,
        messages: [
          message(1, lines[0]!.staffId, 'sent', null),
          message(2, lines[1]!.staffId, 'sent', null),
          message(3, lines[2]!.staffId, 'failed', 'No e-mail address on record.'),
        ],
      }),
    });
    const { user } = openPage(runAccountantMe, routePaths.payroll, routes);
    await screen.findByRole('button', { name: 'Ottoline Brask: open the figures' });
    await user.click(screen.getByRole('button', { name: 'Send statements…' }));
    const dialog = await screen.findByRole('alertdialog');
    expect(dialog.textContent).toContain('E-mail each of the 3 staff members their own statement');
    expect(api.calls(`POST ${runPath}/statements`)).toHaveLength(0);
    await user.click(within(dialog).getByRole('button', { name: 'Send statements' }));
    const outcome = await screen.findByRole('status');
    expect(outcome.textContent).toContain('Statements: 2 sent, 1 failed');
    expect(outcome.textContent).toContain('Ottoline Brask: No e-mail address on record.');
  });

  it('shows the server’s refusal when a download is not allowed', async () => {
    fakeApi({
      'GET /api/payroll/periods': json(200, periodsWith('approved')),
      [`GET ${runPath}`]: json(200, run({ status: 'approved', approvedAt: '2026-03-16T15:00:00.000Z' })),
      [`GET ${runPath}/lines`]: json(200, lines),
      [`GET ${runPath}/workbook`]: problem(409, 'payroll_run.not_approved', 'Approve the payroll run before exporting it.'),
    });
    const { user } = openPage(runAccountantMe, routePaths.payroll, routes);
    await user.click(await screen.findByRole('button', { name: 'Download workbook (.xlsx)' }));
    expect(await screen.findByText('Approve the payroll run before exporting it.')).toBeTruthy();
  });

  it('gives a manager the draft of their branch to read, with nothing to run, approve or download', async () => {
    fakeApi({
      'GET /api/payroll/periods': json(200, periodsWith('draft')),
      [`GET ${runPath}`]: json(200, run()),
      [`GET ${runPath}/lines`]: json(200, lines.slice(0, 2)),
    });
    openPage(runManagerMe, routePaths.payroll, routes);
    await screen.findByRole('button', { name: 'Wren Halloway: open the figures' });
    expect(screen.queryByRole('button', { name: 'Approve…' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Run again' })).toBeNull();
    expect(columnTexts(0).at(-1)).toBe('Total · 2 staff');
  });

  it('offers to set up the pay period holding today when it is missing', async () => {
    const api = fakeApi({
      'GET /api/payroll/periods': json(200, periodsWith('exported')),
      [`GET ${runPath}`]: json(200, run({ status: 'exported', approvedAt: '2026-03-16T15:00:00.000Z', exportedAt: '2026-03-16T15:05:00.000Z' })),
      [`GET ${runPath}/lines`]: json(200, lines),
      'POST /api/payroll/periods': json(201, { id: 'e710d000-0000-4000-8000-000000000002', startDate: '2026-03-15', endDate: '2026-03-28', runId: null, runStatus: null }),
    });
    const { user } = openPage(runAccountantMe, routePaths.payroll, routes);
    await user.click(await screen.findByRole('button', { name: /^Set up Mar 15 – Mar 28, 2026$/ }));
    await waitFor(() => expect(api.calls('POST /api/payroll/periods')).toHaveLength(1));
    expect(JSON.parse(api.calls('POST /api/payroll/periods')[0]!.body)).toEqual({ date: '2026-03-15' });
  });
});
