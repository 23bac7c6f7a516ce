import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router';
import { SignInRoute, signInLoader } from '../features/auth/routes/sign-in.route';
import { BranchListRoute, branchListLoader } from '../features/branches/routes/branch-list.route';
import { CatalogueRoute, catalogueLoader } from '../features/catalogue/routes/catalogue.route';
import { ClientDetailRoute, clientDetailLoader } from '../features/clients/routes/client-detail.route';
import { ClientListRoute, clientListLoader } from '../features/clients/routes/client-list.route';
import { DayCloseRoute, dayCloseLoader } from '../features/day-close/routes/day-close.route';
import { OverviewRoute, overviewLoader } from '../features/overview/routes/overview.route';
import { StaffListRoute, staffListLoader } from '../features/staff/routes/staff-list.route';
import { TicketEditorRoute, ticketEditorLoader } from '../features/tickets/routes/ticket-editor.route';
import { TodayRoute, todayLoader } from '../features/today/routes/today.route';
import { routePaths } from '../lib/route-paths';
import { session } from '../lib/session';
import { AppLoading } from './app-loading';
import { AppShell, shellLoader } from './app-shell';
import { NotFound, RouteError } from './route-error';

export function createRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      id: 'root',
      // On start the refresh cookie decides: signed in again silently, or the sign-in page.
      loader: async () => {
        await session.ready();
        return null;
      },
      HydrateFallback: AppLoading,
      ErrorBoundary: RouteError,
      children: [
        { path: routePaths.signIn, loader: signInLoader(queryClient), Component: SignInRoute },
        {
          loader: shellLoader,
          Component: AppShell,
          children: [
            {
              ErrorBoundary: RouteError,
              children: [
                { index: true, loader: overviewLoader(queryClient), Component: OverviewRoute },
                { path: routePaths.branches, loader: branchListLoader(queryClient), Component: BranchListRoute },
                { path: routePaths.today, loader: todayLoader(queryClient), Component: TodayRoute },
                { path: routePaths.ticket, loader: ticketEditorLoader(queryClient), Component: TicketEditorRoute },
                { path: routePaths.dayClose, loader: dayCloseLoader(queryClient), Component: DayCloseRoute },
                { path: routePaths.clients, loader: clientListLoader(queryClient), Component: ClientListRoute },
                { path: routePaths.client, loader: clientDetailLoader(queryClient), Component: ClientDetailRoute },
                { path: routePaths.catalogue, loader: catalogueLoader(queryClient), Component: CatalogueRoute },
                { path: routePaths.staff, loader: staffListLoader(queryClient), Component: StaffListRoute },
                { path: '*', Component: NotFound },
              ],
            },
          ],
        },
      ],
    },
  ];
}
