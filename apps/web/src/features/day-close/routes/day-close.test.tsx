import { BlueprintProvider } from '@blueprintjs/core';
import { QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { Suspense } from 'react';
import { createMemoryRouter, Outlet, RouterProvider } from 'react-router';
import { afterEach, beforeAll, describe, expect, it } from 'vitest';
import { AbilityContext, abilityFor } from '../../../lib/ability';
import { businessDateIn } from '../../../lib/business-date';
import { createQueryClient } from '../../../lib/query-client';
import { routePaths } from '../../../lib/route-paths';
import { type Me, session } from '../../../lib/session';
import { fakeApi, json, problem } from '../../../test/fake-api';
import { sessionOf } from '../../../test/sessions';
import type { DayPreview } from '../api/day-close-queries';
import { DayCloseRoute, dayCloseLoader } from './day-close.route';

// An invented salon: Fernhollow Hair Studios, its Elmstead branch and its manager.
const organisationId = '6f0c8a52-1d7e-4e11-9c55-0a4b3e2f7d10';
const branch = { id: 'b1a7c1de-0c1f-4a43-8a55-3f1f0f7e0a01', name: 'Elmstead', timeZone: 'America/Chicago', currency: 'USD' };
const managerMe: Me = {
  id: 'c0ffee00-0000-4000-8000-000000000002',
  email: 'manager@example.test',
  displayName: 'Oswin Pell',
  role: 'manager',
  organisationId,
  organisationName: 'Fernhollow Hair Studios',
  staffId: null,
  branches: [branch],
  rules: [
    ['read,create,update,pay,close,void,refund', 'Ticket', { organisationId, branchId: { $in: [branch.id] } }],
    ['manage', 'DayClose', { organisationId, branchId: { $in: [branch.id] } }],
  ],
};

const today = businessDateIn(branch.timeZone);

const preview = (overrides: Partial<DayPreview> = {}): DayPreview => ({
  branchId: branch.id,
  branchName: branch.name,
  businessDate: today,
  close: null,
  ticketsByStatus: { open: 0, closed: 4, void: 0 },
  openTickets: [],
  colourLinesWithoutBowl: [],
  revenueByCategory: [
    { category: 'Colour', amount: '250.00' },
    { category: 'Cuts', amount: '140.00' },
  ],
  serviceRevenue: '390.00',
  retailRevenue: '48.00',
  retailTax: '3.96',
  tipsByStaff: [{ staffId: 'f0000000-0000-4000-8000-000000000001', staffName: 'Wren Halloway', amount: '30.00' }],
  colourProductCost: '17.36',
  cashFromTickets: '212.50',
  cashAdjustments: '0.00',
  expectedCash: '212.50',
  cardTotalTickets: '259.46',
  cardTotalProcessor: '259.46',
  pendingCardPayments: 0,
  adjustments: [],
  varianceNoteThreshold: '5.00',
  readyToClose: true,
  ...overrides,
});

beforeAll(async () => {
  await import('./day-close.route');
}, 60_000);

afterEach(() => session.end());

function openDayClose() {
  session.start(sessionOf(managerMe));
  const queryClient = createQueryClient();
  const router = createMemoryRouter(
    [
      {
        Component: () => (
          <AbilityContext value={abilityFor(managerMe)}>
            <Suspense fallback={null}>
              <Outlet />
            </Suspense>
          </AbilityContext>
        ),
        children: [
          { path: routePaths.dayClose, loader: dayCloseLoader(queryClient), Component: DayCloseRoute },
          { path: routePaths.ticket, Component: () => <p>Ticket</p> },
        ],
      },
    ],
    { initialEntries: [routePaths.dayClose] },
  );
  render(
    <QueryClientProvider client={queryClient}>
      <BlueprintProvider>
        <RouterProvider router={router} />
      </BlueprintProvider>
    </QueryClientProvider>,
  );
  return userEvent.setup();
}

const figure = (name: string) => screen.getByLabelText(name).textContent;

describe('close the day', () => {
  it('asks for a note only while the live cash variance is over the branch threshold, and says why', async () => {
    const api = fakeApi({
      'GET /api/day-close': json(200, preview()),
      'GET /api/staff': json(200, []),
      'POST /api/day-close': json(201, preview({ close: null })),
    });
    const user = openDayClose();
    const counted = await screen.findByLabelText('Cash counted in the drawer');
    const close = screen.getByRole('button', { name: 'Close the day' });
    expect(close.hasAttribute('disabled')).toBe(true);

    await user.type(counted, '200');
    expect(figure('Cash variance')).toBe('12.50 short');
    expect(screen.getByLabelText('Note (required)')).toBeTruthy();
    expect(screen.getByText(/Required: cash 12.50 short and card matches — more than this branch’s 5.00 threshold/)).toBeTruthy();
    expect(close.hasAttribute('disabled')).toBe(true);
    expect(document.getElementById(close.getAttribute('aria-describedby') ?? '')?.textContent).toContain('Write a note explaining the variance.');

    // Within the threshold, the note is optional again.
    await user.clear(counted);
    await user.type(counted, '209');
    expect(figure('Cash variance')).toBe('3.50 short');
    expect(screen.queryByLabelText('Note (required)')).toBeNull();
    expect(close.hasAttribute('disabled')).toBe(false);

    await user.clear(counted);
    await user.type(counted, '200');
    await user.type(screen.getByLabelText('Note (required)'), 'Paid the window cleaner from the drawer.');
    await user.click(close);
    await waitFor(() => expect(api.calls('POST /api/day-close')).toHaveLength(1));
    expect(JSON.parse(api.calls('POST /api/day-close')[0]!.body)).toEqual({
      branchId: branch.id,
      businessDate: today,
      countedCash: '200.00',
      note: 'Paid the window cleaner from the drawer.',
    });
  });

  it('counts the drawer by denomination with the same reconciliation', async () => {
    const api = fakeApi({ 'GET /api/day-close': json(200, preview()), 'GET /api/staff': json(200, []), 'POST /api/day-close': json(201, preview()) });
    const user = openDayClose();
    await user.click(await screen.findByRole('radio', { name: 'By denomination' }));
    const drawer = within(screen.getByRole('table', { name: 'Cash by denomination' }));
    await user.type(drawer.getByLabelText('How many 100'), '2');
    await user.type(drawer.getByLabelText('How many 10'), '1');
    await user.type(drawer.getByLabelText('How many 1'), '2');
    await user.type(drawer.getByLabelText('How many 0.25'), '2');
    expect(figure('Cash variance')).toBe('matches');
    await user.click(screen.getByRole('button', { name: 'Close the day' }));
    await waitFor(() => expect(api.calls('POST /api/day-close')).toHaveLength(1));
    expect(JSON.parse(api.calls('POST /api/day-close')[0]!.body).denominations).toEqual({ '100': 2, '10': 1, '1': 2, '0.25': 2 });
  });

  it('lists what stands in the way, ticked or not, and shows the server’s refusal', async () => {
    fakeApi({
      'GET /api/day-close': json(
        200,
        preview({
          openTickets: [{ id: '70000000-0000-4000-8000-000000000009', number: 9, clientName: 'Perrin Oakes', due: '45.00' }],
          ticketsByStatus: { open: 1, closed: 3, void: 0 },
          readyToClose: false,
        }),
      ),
      'GET /api/staff': json(200, []),
      'POST /api/day-close': problem(409, 'day.open_tickets', 'Close or void every ticket first: ticket 9 still open.'),
    });
    const user = openDayClose();
    const checklist = await screen.findByRole('region', { name: 'Before closing' });
    expect(within(checklist).getByText(/1 ticket is still open/)).toBeTruthy();
    expect(within(checklist).getByRole('link', { name: 'Ticket 9' })).toBeTruthy();
    expect(within(checklist).getAllByText('Done')).toHaveLength(2);
    expect(within(checklist).getAllByText('To do')).toHaveLength(1);
    await user.type(screen.getByLabelText('Cash counted in the drawer'), '212.50');
    expect(screen.getByRole('button', { name: 'Close the day' }).hasAttribute('disabled')).toBe(true);
    expect(screen.getByText('Finish the checklist above first.')).toBeTruthy();
  });

  it('shows a closed day as recorded, with nothing to close', async () => {
    fakeApi({
      'GET /api/day-close': json(
        200,
        preview({
          close: {
            id: '90000000-0000-4000-8000-000000000001',
            branchId: branch.id,
            businessDate: today,
            expectedCash: '212.50',
            countedCash: '200.00',
            cashVariance: '-12.50',
            cardTotalTickets: '259.46',
            cardTotalProcessor: '259.46',
            cardVariance: '0.00',
            cashDenominations: null,
            note: 'Paid the window cleaner from the drawer.',
            closedById: 'c0ffee00-0000-4000-8000-000000000002',
            closedAt: '2026-03-15T01:10:00.000Z',
          },
        }),
      ),
      'GET /api/staff': json(200, []),
    });
    openDayClose();
    expect(await screen.findByRole('heading', { name: 'The close as recorded' })).toBeTruthy();
    expect(screen.getByText('12.50 short')).toBeTruthy();
    expect(screen.getByText('Paid the window cleaner from the drawer.')).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Close the day' })).toBeNull();
    expect(screen.getByText(/Today is closed at Elmstead/)).toBeTruthy();
  });
});
