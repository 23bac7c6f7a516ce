import type { QueryClient } from '@tanstack/react-query';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { routePaths } from '../../../lib/route-paths';
import { fakeApi, json } from '../../../test/fake-api';
import { openPage } from '../../../test/test-page';
import { elmstead, levels, staffDeskMe, staffManagerMe, staffOwnerMe, staffWithoutPay, staffWithPay } from '../staff-test-data';
import { StaffListRoute, staffListLoader } from './staff-list.route';

const routes = (queryClient: QueryClient) => [{ path: routePaths.staff, loader: staffListLoader(queryClient), Component: StaffListRoute }];

const columns = (table: HTMLElement) =>
  within(table)
    .getAllByRole('columnheader')
    .map((h) => h.textContent);

describe('People', () => {
  it('shows no pay column to someone whose staff list carries no pay figures', async () => {
    fakeApi({ 'GET /api/staff': json(200, staffWithoutPay), 'GET /api/catalogue/levels': json(200, levels) });
    openPage(staffDeskMe, '/people', routes);

    const table = await screen.findByRole('table', { name: 'Staff' });
    expect(columns(table)).not.toContain('Hourly rate');
    expect(within(table).getByRole('cell', { name: 'Jorunn Aldersey' })).toBeTruthy();
    expect(screen.queryByText('4.50')).toBeNull();
    expect(screen.queryByRole('button', { name: /^Edit / })).toBeNull();
    expect(screen.queryByRole('button', { name: 'New staff member' })).toBeNull();
  });

  it('shows a manager the hourly rates by branch, and those who have left on request', async () => {
    fakeApi({ 'GET /api/staff': json(200, staffWithPay), 'GET /api/catalogue/levels': json(200, levels) });
    const { user } = openPage(staffManagerMe, '/people', routes);

    const table = await screen.findByRole('table', { name: 'Staff' });
    expect(columns(table)).toContain('Hourly rate');
    expect(within(table).getByRole('cell', { name: '4.50' })).toBeTruthy();
    expect(within(table).getByRole('columnheader', { name: /Elmstead/ })).toBeTruthy();
    expect(within(table).getByRole('columnheader', { name: /Quarry Lane/ })).toBeTruthy();
    expect(within(table).queryByRole('cell', { name: 'Casimir Wendle' })).toBeNull();

    await user.click(screen.getByLabelText('Show those who have left (1)'));
    expect(within(table).getByRole('cell', { name: 'Casimir Wendle' })).toBeTruthy();
    expect(within(table).getByText('Left')).toBeTruthy();
  });

  it('lets a manager edit staff but not their pay', async () => {
    const api = fakeApi({
      'GET /api/staff': json(200, staffWithPay),
      'GET /api/catalogue/levels': json(200, levels),
      'PATCH /api/staff/57aff000-0000-4000-8000-000000000001': json(200, { ...staffWithPay[0], levelId: levels[0]?.id, levelName: 'Emerging' }),
    });
    const { user } = openPage(staffManagerMe, '/people', routes);

    await user.click(await screen.findByRole('button', { name: 'Edit Jorunn Aldersey' }));
    expect(screen.queryByLabelText('Hourly rate')).toBeNull();
    expect(screen.getByText('(pay figures are changed by the owner)')).toBeTruthy();
    await user.selectOptions(screen.getByLabelText('Level'), 'Emerging');
    await user.click(screen.getByRole('button', { name: 'Save changes' }));

    await waitFor(() => expect(api.calls('PATCH /api/staff/57aff000-0000-4000-8000-000000000001')).toHaveLength(1));
    expect(JSON.parse(api.calls('PATCH /api/staff/57aff000-0000-4000-8000-000000000001')[0]?.body ?? '')).toEqual({ levelId: levels[0]?.id });
  });

  it('lets the owner add a staff member with an hourly rate', async () => {
    const api = fakeApi({
      'GET /api/staff': json(200, staffWithPay),
      'GET /api/catalogue/levels': json(200, levels),
      'POST /api/staff': json(201, { ...staffWithPay[0], id: '57aff000-0000-4000-8000-000000000009', displayName: 'Ysolde Brackwater' }),
    });
    const { user } = openPage(staffOwnerMe, `/people?branch=${elmstead.id}`, routes);

    await user.click(await screen.findByRole('button', { name: 'New staff member' }));
    await user.type(screen.getByLabelText('Name'), 'Ysolde Brackwater');
    await user.selectOptions(screen.getByLabelText('Level'), 'Lead');
    await user.type(screen.getByLabelText('Hourly rate'), '3.25{Enter}');

    await waitFor(() => expect(api.calls('POST /api/staff')).toHaveLength(1));
    expect(JSON.parse(api.calls('POST /api/staff')[0]?.body ?? '')).toEqual({
      displayName: 'Ysolde Brackwater',
      email: null,
      levelId: levels[1]?.id,
      homeBranchId: elmstead.id,
      hourlyRate: '3.25',
    });
  });
});
