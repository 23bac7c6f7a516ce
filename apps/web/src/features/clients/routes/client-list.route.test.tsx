import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { fakeApi, json, problem } from '../../../test/fake-api';
import { routePaths } from '../../../lib/route-paths';
import { branchesWithWindows, clientRow, clientStylistMe, daysAgo, frontDeskMe } from '../client-test-data';
import { openPage } from '../../../test/test-page';
import type { QueryClient } from '@tanstack/react-query';
import { ClientListRoute, clientListLoader } from './client-list.route';

const routes = (queryClient: QueryClient) => [{ path: routePaths.clients, loader: clientListLoader(queryClient), Component: ClientListRoute }];

// Sixty clients of Elmstead; one of them, Wren, has allergy notes and a recent patch test.
const everyone = Array.from({ length: 60 }, (_, n) =>
  n === 40 ? clientRow(n, { firstName: 'Wren', allergyNotes: 'Latex: nitrile gloves only.', lastPatchTestOn: daysAgo(30) }) : clientRow(n),
);

function clientDirectory() {
  const asked: string[] = [];
  const api = fakeApi({
    'GET /api/branches': json(200, branchesWithWindows),
    'POST /api/clients': problem(400, 'request.invalid', 'Check these fields: phone.', [{ field: 'phone', message: 'phone must be up to 30 digits' }]),
    'GET /api/clients': (request) => {
      asked.push(new URL(request.url).search);
      const query = new URL(request.url).searchParams;
      const search = (query.get('search') ?? '').toLowerCase();
      const limit = Number(query.get('limit'));
      const offset = Number(query.get('offset') ?? 0);
      const found = everyone.filter((c) => `${c.firstName} ${c.lastName}`.toLowerCase().includes(search));
      return json(200, { items: found.slice(offset, offset + limit), total: found.length, limit, offset });
    },
  });
  return { ...api, asked };
}

describe('client list', () => {
  it('pages through the clients and finds one by name', async () => {
    const api = clientDirectory();
    const { user } = openPage(frontDeskMe, '/clients', routes);

    const table = await screen.findByRole('table', { name: 'Clients' });
    expect(within(table).getAllByRole('row')).toHaveLength(1 + 25);
    expect(screen.getByText('1–25 of 60')).toBeTruthy();
    expect(screen.getByText('60 clients.')).toBeTruthy();

    await user.click(screen.getByRole('button', { name: 'Next' }));
    expect(await screen.findByText('26–50 of 60')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Previous' }).hasAttribute('disabled')).toBe(false);

    await user.type(screen.getByRole('searchbox', { name: 'Find a client by name, phone or e-mail' }), 'wren');
    expect(await screen.findByText('1 client matches “wren”.')).toBeTruthy();
    const rows = within(screen.getByRole('table', { name: 'Clients' })).getAllByRole('row');
    expect(rows).toHaveLength(2);
    const wren = rows[1] as HTMLElement;
    expect(within(wren).getByRole('link').textContent).toBe('Harrowgate-40, Wren');
    expect(within(wren).getByText('Covers colour')).toBeTruthy();
    expect(within(wren).getByText('Latex: nitrile gloves only.')).toBeTruthy();
    // A new search starts again from the first page.
    expect(api.asked.at(-1)).toBe('?search=wren&limit=25&offset=0');
    expect(screen.queryByRole('navigation', { name: 'Client pages' })).toBeNull();
  });

  it('says in words that a client has no patch test on record', async () => {
    clientDirectory();
    openPage(frontDeskMe, '/clients', routes);

    const table = await screen.findByRole('table', { name: 'Clients' });
    expect(within(table).getAllByText('None on record')).toHaveLength(25);
  });

  it('lets a stylist read the clients she serves but not add one', async () => {
    clientDirectory();
    openPage(clientStylistMe, '/clients', routes);

    expect(await screen.findByText('60 clients you have served.')).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'New client' })).toBeNull();
  });

  it('adds a client and shows the server’s field problems under their fields', async () => {
    const api = clientDirectory();
    const { user, router } = openPage(frontDeskMe, '/clients', routes);
    await screen.findByRole('table', { name: 'Clients' });

    await user.click(screen.getByRole('button', { name: 'New client' }));
    await user.type(screen.getByLabelText('First name'), 'Maelis');
    await user.type(screen.getByLabelText('Last name'), 'Quillfeather');
    await user.type(screen.getByLabelText('Phone'), 'call me');
    await user.click(screen.getByRole('button', { name: 'Add client' }));

    await waitFor(() => expect(screen.getByLabelText('Phone').getAttribute('aria-invalid')).toBe('true'));
    expect(screen.getByText('phone must be up to 30 digits')).toBeTruthy();
    expect(document.activeElement).toBe(screen.getByLabelText('Phone'));
    expect(router.state.location.pathname).toBe('/clients');
    expect(JSON.parse(api.calls('POST /api/clients')[0]?.body ?? '')).toEqual({
      firstName: 'Maelis',
      lastName: 'Quillfeather',
      homeBranchId: frontDeskMe.branches[0]?.id,
      phone: 'call me',
      email: null,
      lastPatchTestOn: null,
      allergyNotes: '',
      notes: '',
    });
  });
});
