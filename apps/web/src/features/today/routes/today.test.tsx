import { BlueprintProvider } from '@blueprintjs/core';
import { QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { Suspense } from 'react';
import { createMemoryRouter, Outlet, RouterProvider, useParams } from 'react-router';
import { afterEach, beforeAll, describe, expect, it } from 'vitest';
import { AbilityContext, abilityFor } from '../../../lib/ability';
import { businessDateIn } from '../../../lib/business-date';
import { createQueryClient } from '../../../lib/query-client';
import { routePaths } from '../../../lib/route-paths';
import { type Me, session } from '../../../lib/session';
import { fakeApi, json, problem } from '../../../test/fake-api';
import { sessionOf } from '../../../test/sessions';
import type { TicketSummary } from '../api/today-queries';
import { TodayRoute, todayLoader } from './today.route';

// An invented salon: Fernhollow Hair Studios, its Elmstead branch and its front desk.
const organisationId = '6f0c8a52-1d7e-4e11-9c55-0a4b3e2f7d10';
const branch = { id: 'b1a7c1de-0c1f-4a43-8a55-3f1f0f7e0a01', name: 'Elmstead', timeZone: 'America/Chicago', currency: 'USD' };
const frontDeskMe: Me = {
  id: 'c0ffee00-0000-4000-8000-000000000003',
  email: 'desk@example.test',
  displayName: 'Maren Ashby',
  role: 'front_desk',
  organisationId,
  organisationName: 'Fernhollow Hair Studios',
  staffId: null,
  branches: [branch],
  rules: [['read,create,update,pay,close', 'Ticket', { organisationId, branchId: { $in: [branch.id] } }]],
};
const today = businessDateIn(branch.timeZone);

const summary = (overrides: Partial<TicketSummary>): TicketSummary => ({
  id: '70000000-0000-4000-8000-000000000001',
  number: 1,
  businessDate: today,
  status: 'open',
  clientName: 'Perrin Oakes',
  staffNames: ['Wren Halloway'],
  services: '125.00',
  total: '125.00',
  paid: '0.00',
  due: '125.00',
  colourLinesWithoutBowl: 1,
  openedAt: '2026-03-14T15:00:00.000Z',
  locked: false,
  ...overrides,
});

beforeAll(async () => {
  await import('./today.route');
}, 60_000);

afterEach(() => session.end());

function openToday(path: string) {
  session.start(sessionOf(frontDeskMe));
  const queryClient = createQueryClient();
  const router = createMemoryRouter(
    [
      {
        Component: () => (
          <AbilityContext value={abilityFor(frontDeskMe)}>
            <Suspense fallback={null}>
              <Outlet />
            </Suspense>
          </AbilityContext>
        ),
        children: [
          { path: routePaths.today, loader: todayLoader(queryClient), Component: TodayRoute },
          { path: routePaths.ticket, Component: () => <p>Editing ticket {useParams().ticketId}</p> },
        ],
      },
    ],
    { initialEntries: [path] },
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

describe('Today', () => {
  it('lists the day’s tickets with their state in words, what is still due, and colour waiting for a bowl', async () => {
    fakeApi({
      'GET /api/tickets': json(200, [
        summary({}),
        summary({ id: '70000000-0000-4000-8000-000000000002', number: 2, status: 'closed', clientName: null, paid: '70.00', due: '0.00', services: '70.00', total: '70.00', colourLinesWithoutBowl: 0 }),
        summary({ id: '70000000-0000-4000-8000-000000000003', number: 3, status: 'void', total: '40.00', services: '40.00', due: '40.00', colourLinesWithoutBowl: 0 }),
      ]),
    });
    openToday(routePaths.today);

    const table = await screen.findByRole('table', { name: 'Tickets' });
    const rows = within(table).getAllByRole('row');
    expect(within(rows[1]!).getByText('Open')).toBeTruthy();
    expect(within(rows[1]!).getByText('Bowl to record')).toBeTruthy();
    expect(within(rows[2]!).getByText('Closed')).toBeTruthy();
    expect(within(rows[2]!).getByText('Walk-in')).toBeTruthy();
    expect(within(rows[3]!).getByText('Void')).toBeTruthy();
    // The day's sums leave the voided ticket out.
    const sums = within(rows[4]!);
    expect(sums.getByText('2 tickets, and 1 void')).toBeTruthy();
    expect(sums.getAllByRole('cell').map((cell) => cell.textContent)).toEqual(['195.00', '195.00', '70.00', '125.00', '']);
    expect(screen.getByRole('button', { name: 'Open a ticket' })).toBeTruthy();
  });

  it('shows a past day read only, and says when it is closed', async () => {
    const api = fakeApi({ 'GET /api/tickets': json(200, [summary({ businessDate: '2026-03-02', status: 'closed', locked: true, colourLinesWithoutBowl: 0 })]) });
    openToday(`${routePaths.today}?date=2026-03-02`);

    expect(await screen.findByText(/a past day, read only/)).toBeTruthy();
    expect(screen.getByText(/This day is closed/)).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Open a ticket' })).toBeNull();
    expect(api.seen[0]?.path).toBe('/api/tickets');
  });

  it('opens a walk-in ticket and goes to it; a refusal is shown in the server’s words', async () => {
    const api = fakeApi({
      'GET /api/tickets': json(200, []),
      'GET /api/clients': json(200, { items: [], total: 0, limit: 8, offset: 0 }),
      'POST /api/tickets': [
        problem(409, 'day.locked', `The day ${today} is closed, so its tickets are locked. Corrections go in as dated adjustments on a later open day.`),
        json(201, { id: '70000000-0000-4000-8000-000000000042' }),
      ],
    });
    const user = openToday(routePaths.today);
    await user.click((await screen.findAllByRole('button', { name: 'Open a ticket' }))[0]!);
    const dialog = await screen.findByRole('dialog', { name: 'Open a ticket at Elmstead' });
    await user.type(within(dialog).getByLabelText('Find the client by name, phone or e-mail'), 'Zzz');
    expect(await within(dialog).findByText(/No client matches/)).toBeTruthy();

    await user.click(within(dialog).getByRole('button', { name: 'Walk-in, no client record' }));
    expect((await within(dialog).findByRole('alert')).textContent).toContain('is closed, so its tickets are locked');
    await user.click(within(dialog).getByRole('button', { name: 'Walk-in, no client record' }));

    expect(await screen.findByText('Editing ticket 70000000-0000-4000-8000-000000000042')).toBeTruthy();
    await waitFor(() => expect(api.calls('POST /api/tickets')).toHaveLength(2));
    expect(JSON.parse(api.calls('POST /api/tickets')[1]!.body)).toEqual({ branchId: branch.id });
  });
});
