import type { QueryClient } from '@tanstack/react-query';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { routePaths } from '../../../lib/route-paths';
import { fakeApi, json } from '../../../test/fake-api';
import { openPage } from '../../../test/test-page';
import type { TimesheetImport } from '../api/timesheet-queries';
import { elmstead, elmsteadStaff, entries, periodId, periodsWith, runAccountantMe, runManagerMe } from '../components/run-test-data';
import { HoursRoute, hoursLoader } from './hours.route';

const routes = (queryClient: QueryClient) => [{ path: routePaths.payrollHours, loader: hoursLoader(queryClient), Component: HoursRoute }];
const [wren, tamsin] = elmsteadStaff as [(typeof elmsteadStaff)[number], (typeof elmsteadStaff)[number]];
const importPath = `POST /api/payroll/periods/${periodId}/timesheets/import`;

type Reply = Response | ((request: Request) => Response);
const scripted = (extra: Record<string, Reply | Reply[]> = {}, runStatus: 'draft' | 'approved' | null = null) =>
  fakeApi({
    'GET /api/payroll/periods': json(200, periodsWith(runStatus)),
    [`GET /api/payroll/periods/${periodId}/timesheets`]: json(200, entries),
    'GET /api/staff': json(200, elmsteadStaff),
    ...extra,
  });

const preview = (rows: TimesheetImport['rows'], committed = false): TimesheetImport => ({
  committed,
  rows,
  validRows: rows.filter((r) => r.errors.length === 0).length,
  invalidRows: rows.filter((r) => r.errors.length > 0).length,
});

describe('Payroll: hours', () => {
  it('lets a manager type a day’s hours, refusing more than 24 or fewer than 0 before anything is sent', async () => {
    const api = scripted({
      'PUT /api/payroll/timesheets': json(200, { ...entries[0], id: 'e0000000-0000-4000-8000-000000000009', date: '2026-03-03', hours: '7.5' }),
    });
    const { user } = openPage(runManagerMe, routePaths.payrollHours, routes);

    const table = await screen.findByRole('table', { name: 'Hours by staff member and day' });
    expect((within(table).getByLabelText('Wren Halloway, Mon, Mar 2: hours') as HTMLInputElement).value).toBe('9.5');
    const cell = within(table).getByLabelText('Wren Halloway, Tue, Mar 3: hours') as HTMLInputElement;

    await user.type(cell, '25');
    expect(screen.getByRole('alert').textContent).toBe('Wren Halloway, Tue, Mar 3: A day holds at most 24 hours.');
    expect(cell.getAttribute('aria-invalid')).toBe('true');
    await user.keyboard('{Enter}');
    await user.clear(cell);
    await user.type(cell, '-2');
    expect(screen.getByRole('alert').textContent).toBe('Wren Halloway, Tue, Mar 3: Hours cannot be negative.');
    await user.tab();
    expect(api.calls('PUT /api/payroll/timesheets')).toHaveLength(0);

    await user.clear(cell);
    await user.type(cell, '7.50{Enter}');
    expect(screen.queryByRole('alert')).toBeNull();
    await waitFor(() => expect(api.calls('PUT /api/payroll/timesheets')).toHaveLength(1));
    expect(JSON.parse(api.calls('PUT /api/payroll/timesheets')[0]!.body)).toEqual({ staffId: wren.id, branchId: elmstead.id, date: '2026-03-03', hours: '7.5' });
    // Leaving the cell after Enter sends nothing more.
    await user.tab();
    expect(api.calls('PUT /api/payroll/timesheets')).toHaveLength(1);
    expect(await screen.findByText('Saved Wren Halloway, Tue, Mar 3: 7.5 h.')).toBeTruthy();
  });

  it('adds up each person’s hours and each day’s', async () => {
    scripted();
    openPage(runManagerMe, routePaths.payrollHours, routes);
    const table = await screen.findByRole('table', { name: 'Hours by staff member and day' });
    const rows = within(table).getAllByRole('row');
    const cellsOf = (row: HTMLElement) => within(row).queryAllByRole('cell').map((c) => c.textContent);
    const total = rows.at(-1)!;
    // 9.5 + 6.25 on Mar 2 (added by hand); the grand total is the same 15.75.
    expect(cellsOf(total)[1]).toBe('15.75');
    expect(cellsOf(total).at(-1)).toBe('15.75');
    expect(within(table).getByRole('row', { name: /Tamsin Greaves/ }).textContent).toContain('6.25');
  });

  it('shows the accountant the hours to read, with nothing to type or upload', async () => {
    scripted();
    openPage(runAccountantMe, routePaths.payrollHours, routes);
    const table = await screen.findByRole('table', { name: 'Hours by staff member and day' });
    expect(within(table).queryAllByRole('textbox')).toHaveLength(0);
    expect(within(table).getByLabelText('Wren Halloway, Mon, Mar 2: 9.5 hours')).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Upload a timesheet…' })).toBeNull();
  });

  it('keeps an approved period’s hours frozen', async () => {
    scripted({}, 'approved');
    openPage(runManagerMe, routePaths.payrollHours, routes);
    expect(await screen.findByText('This period’s payroll is approved')).toBeTruthy();
    expect(within(screen.getByRole('table', { name: 'Hours by staff member and day' })).queryAllByRole('textbox')).toHaveLength(0);
  });

  it('previews an upload row by row and offers to save only a file without errors', async () => {
    const bad = preview([
      { row: 2, values: { staff_id: wren.id, date: '2026-03-03', hours: '8' }, errors: [] },
      { row: 3, values: { staff_id: tamsin.id, date: '2026-03-03', hours: '26' }, errors: [{ field: 'hours', message: '26 hours is more than a day holds (24).' }] },
    ]);
    const good = preview([
      { row: 2, values: { staff_id: wren.id, date: '2026-03-03', hours: '8' }, errors: [] },
      { row: 3, values: { staff_id: tamsin.id, date: '2026-03-03', hours: '6' }, errors: [] },
    ]);
    const commits: (string | null)[] = [];
    const answer = (body: TimesheetImport) => (request: Request) => {
      commits.push(new URL(request.url).searchParams.get('commit'));
      return json(200, body);
    };
    const api = scripted({ [importPath]: [answer(bad), answer(good), answer({ ...good, committed: true })] });
    const { user } = openPage(runManagerMe, routePaths.payrollHours, routes);

    await user.click(await screen.findByRole('button', { name: 'Upload a timesheet…' }));
    const dialog = await screen.findByRole('dialog');
    const input = within(dialog).getByLabelText('Timesheet file');
    await user.upload(input, new File(['staff_id,date,hours\n'], 'hours.csv', { type: 'text/csv' }));

    const table = await within(dialog).findByRole('table', { name: 'Preview of the hours' });
    expect(within(dialog).getByText('1 row with errors')).toBeTruthy();
    const badRow = within(table).getAllByRole('row')[2]!;
    expect(badRow.textContent).toContain('Tamsin Greaves');
    expect(badRow.textContent).toContain('26 hours is more than a day holds (24).');
    expect(within(dialog).queryByRole('button', { name: /^Save all/ })).toBeNull();
    expect(api.calls(importPath)).toHaveLength(1);

    await user.upload(input, new File(['staff_id,date,hours\n'], 'hours-fixed.csv', { type: 'text/csv' }));
    await user.click(await within(dialog).findByRole('button', { name: 'Save all 2 rows' }));
    await waitFor(() => expect(api.calls(importPath)).toHaveLength(3));
    // Two previews, then the one all-or-nothing commit.
    expect(commits).toEqual(['false', 'false', 'true']);
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
  });
});
