import { render, screen, within } from '@testing-library/react';
import { createMemoryRouter } from 'react-router';
import { beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { fakeApi, json, problem } from '../test/fake-api';
import { branchRows, ownerMe, sessionOf, stylistMe } from '../test/sessions';
import type { components } from '../lib/api-schema';

type MeView = components['schemas']['MeView'];

// Loading the whole app the first time is slow on a busy machine; do it once outside any test's clock.
beforeAll(async () => {
  await Promise.all([import('./app'), import('./routes')]);
}, 60_000);

// Each test is a fresh page load: the in-memory session starts empty and asks the server once.
beforeEach(() => {
  vi.resetModules();
});

async function openApp(path: string) {
  const [{ App }, { createRoutes }, { createQueryClient }] = await Promise.all([
    import('./app'),
    import('./routes'),
    import('../lib/query-client'),
  ]);
  const queryClient = createQueryClient();
  const router = createMemoryRouter(createRoutes(queryClient), { initialEntries: [path] });
  render(<App queryClient={queryClient} router={router} />);
  return router;
}

const signedInAs = (me: MeView) =>
  fakeApi({
    'POST /api/auth/refresh': json(200, sessionOf(me)),
    'GET /api/auth/me': json(200, me),
    'GET /api/branches': json(200, branchRows),
  });

describe('app shell', () => {
  it('restores the session from the cookie and shows an owner the branch administration', async () => {
    signedInAs(ownerMe);
    await openApp('/');

    const nav = await screen.findByRole('navigation', { name: 'Main' });
    expect(within(nav).getByRole('link', { name: 'Overview' })).toBeTruthy();
    expect(within(nav).getByRole('link', { name: 'Branches' })).toBeTruthy();
    expect(await screen.findByRole('heading', { name: 'Welcome, Ines Marwood' })).toBeTruthy();
    expect(screen.getByText('Fernhollow Hair Studios')).toBeTruthy();
  });

  it('gives a stylist no branch administration in the navigation', async () => {
    signedInAs(stylistMe);
    await openApp('/');

    const nav = await screen.findByRole('navigation', { name: 'Main' });
    expect(within(nav).getByRole('link', { name: 'Overview' })).toBeTruthy();
    expect(within(nav).queryByRole('link', { name: 'Branches' })).toBeNull();
  });

  it('refuses the branches page to a stylist who types its address', async () => {
    const api = signedInAs(stylistMe);
    await openApp('/branches');

    expect(await screen.findByRole('heading', { name: 'Not part of your role' })).toBeTruthy();
    expect(screen.queryByRole('table', { name: 'Branches' })).toBeNull();
    expect(api.calls('GET /api/branches')).toHaveLength(0);
  });

  it('lists every branch for an owner, one row each', async () => {
    signedInAs(ownerMe);
    await openApp('/branches');

    const table = await screen.findByRole('table', { name: 'Branches' });
    expect(within(table).getAllByRole('row')).toHaveLength(1 + branchRows.length);
    expect(within(table).getByRole('cell', { name: 'Quarry Lane' })).toBeTruthy();
    expect(within(table).getByRole('cell', { name: '8.25 %' })).toBeTruthy();
  });

  it('sends someone without a session to sign in, and back to the page they asked for', async () => {
    fakeApi({ 'POST /api/auth/refresh': problem(401, 'auth.not_signed_in', 'Your session has ended; sign in again.') });
    const router = await openApp('/branches');

    expect(await screen.findByRole('button', { name: 'Sign in' })).toBeTruthy();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe('?next=%2Fbranches');
  });
});
