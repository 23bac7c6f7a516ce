import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router';
import { SignInRoute, signInLoader } from '../features/auth/routes/sign-in.route';
import { BranchListRoute, branchListLoader } from '../features/branches/routes/branch-list.route';
import { CatalogueRoute, catalogueLoader } from '../features/catalogue/routes/catalogue.route';
import { ClientDetailRoute, clientDetailLoader } from '../features/clients/routes/client-detail.route';
import { ClientListRoute, clientListLoader } from '../features/clients/routes/client-list.route';
import { CompareBranchRoute, compareBranchLoader } from '../features/compare/routes/compare-branch.route';
import { CompareFeesRoute, compareFeesLoader } from '../features/compare/routes/compare-fees.route';
import { CompareRoute, compareLoader } from '../features/compare/routes/compare.route';
import { DayCloseRoute, dayCloseLoader } from '../features/day-close/routes/day-close.route';
import { EarningsRoute, earningsLoader } from '../features/earnings/routes/earnings.route';
import { OutboxRoute, outboxLoader } from '../features/outbox/routes/outbox.route';
import { OverviewRoute, overviewLoader } from '../features/overview/routes/overview.route';
import { HoursRoute, hoursLoader } from '../features/payroll/routes/hours.route';
import { PayPlansRoute, payPlansLoader } from '../features/payroll/routes/pay-plans.route';
import { PayrollRoute, payrollLoader } from '../features/payroll/routes/payroll.route';
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
                { path: routePaths.payroll, loader: payrollLoader(queryClient), Component: PayrollRoute },
                { path: routePaths.payrollPlans, loader: payPlansLoader(queryClient), Component: PayPlansRoute },
                { path: routePaths.payrollHours, loader: hoursLoader(queryClient), Component: HoursRoute },
                { path: routePaths.compare, loader: compareLoader(queryClient), Component: CompareRoute },
                { path: routePaths.compareBranch, loader: compareBranchLoader(queryClient), Component: CompareBranchRoute },
                { path: routePaths.compareFees, loader: compareFeesLoader(queryClient), Component: CompareFeesRoute },
                { path: routePaths.earnings, loader: earningsLoader(queryClient), Component: EarningsRoute },
                { path: routePaths.outbox, loader: outboxLoader(queryClient), Component: OutboxRoute },
                { path: '*', Component: NotFound },
              ],
            },
          ],
        },
      ],
    },
  ];
}
