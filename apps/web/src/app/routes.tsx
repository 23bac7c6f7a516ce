import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router';
import { SignInRoute, signInLoader } from '../features/auth/routes/sign-in.route';
import { BranchListRoute, branchListLoader } from '../features/branches/routes/branch-list.route';
import { OverviewRoute, overviewLoader } from '../features/overview/routes/overview.route';
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
                { path: '*', Component: NotFound },
              ],
            },
          ],
        },
      ],
    },
  ];
}
