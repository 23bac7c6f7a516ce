import { BlueprintProvider } from '@blueprintjs/core';
import { type QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, isRouteErrorResponse, Outlet, RouterProvider, type RouteObject, useRouteError } from 'react-router';
import { afterEach } from 'vitest';
import { AbilityContext, abilityFor } from '../lib/ability';
import { errorMessage } from '../lib/api-error';
import { createQueryClient } from '../lib/query-client';
import { type Me, session } from '../lib/session';
import { sessionOf } from './sessions';

afterEach(() => session.end());

/** Signs `me` in and opens `path` among this feature's routes, as the app shell would show them. */
export function openPage(me: Me, path: string, routes: (queryClient: QueryClient) => RouteObject[]) {
  session.start(sessionOf(me));
  const queryClient = createQueryClient();
  const router = createMemoryRouter(
    [
      {
        Component: () => (
          <AbilityContext value={abilityFor(me)}>
            <Outlet />
          </AbilityContext>
        ),
        HydrateFallback: () => <p>Loading</p>,
        children: routes(queryClient).map((route) => ({ ...route, ErrorBoundary: PageError })),
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
  return { router, user: userEvent.setup() };
}

function PageError() {
  const error = useRouteError();
  return <p role="alert">{isRouteErrorResponse(error) ? String(error.data?.message) : errorMessage(error)}</p>;
}
