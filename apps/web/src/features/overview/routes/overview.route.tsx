import { H1, H2, HTMLTable, NonIdealState } from '@blueprintjs/core';
import { OfficeIcon } from '@blueprintjs/icons';
import { type QueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { useMemo } from 'react';
import { Link, type LoaderFunctionArgs } from 'react-router';
import { useAbility } from '../../../lib/ability';
import { roleLabels } from '../../../lib/role-labels';
import { routePaths } from '../../../lib/route-paths';
import { requireUser } from '../../../lib/session';
import { overviewQueries } from '../api/overview-queries';

export function overviewLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    await requireUser(request);
    await queryClient.ensureQueryData(overviewQueries.me());
    return null;
  };
}

function localNow(timeZone: string, now: Date): { date: string; time: string } {
  return {
    date: new Intl.DateTimeFormat(undefined, { timeZone, weekday: 'short', month: 'short', day: 'numeric' }).format(now),
    time: new Intl.DateTimeFormat(undefined, { timeZone, hour: 'numeric', minute: '2-digit' }).format(now),
  };
}

export function OverviewRoute() {
  const { data: me } = useSuspenseQuery(overviewQueries.me());
  const ability = useAbility();
  const now = useMemo(() => new Date(), []);
  const runsBranches = ability.can('update', 'Branch');
  const everyBranch = me.role === 'owner' || me.role === 'accountant';

  return (
    <section className="tr-page">
      <header className="tr-page-header">
        <div>
          <H1 className="tr-page-title">Welcome, {me.displayName}</H1>
          <p className="tr-muted">
            {roleLabels[me.role]} at {me.organisationName}
          </p>
        </div>
      </header>

      <div className="tr-panel">
        <H2 className="tr-panel-title">{everyBranch ? 'All branches' : me.branches.length === 1 ? 'Your branch' : 'Your branches'}</H2>
        {me.branches.length === 0 ? (
          <NonIdealState
            icon={<OfficeIcon />}
            title="No branch yet"
            description={runsBranches ? 'Add the first branch to start.' : 'Ask the owner to assign you to a branch.'}
          />
        ) : (
          <HTMLTable compact className="tr-table" aria-label="Local date and time">
            <thead>
              <tr>
                <th scope="col">Branch</th>
                <th scope="col">Time zone</th>
                <th scope="col">Business date</th>
                <th scope="col" className="tr-figure">
                  Local time
                </th>
                <th scope="col">Currency</th>
              </tr>
            </thead>
            <tbody>
              {me.branches.map((branch) => {
                const local = localNow(branch.timeZone, now);
                return (
                  <tr key={branch.id}>
                    <td className="tr-row-head">{branch.name}</td>
                    <td className="tr-nowrap">{branch.timeZone.replaceAll('_', ' ')}</td>
                    <td>{local.date}</td>
                    <td className="tr-figure">{local.time}</td>
                    <td>{branch.currency}</td>
                  </tr>
                );
              })}
            </tbody>
          </HTMLTable>
        )}
        <p className="tr-panel-note tr-muted">
          {runsBranches ? (
            <>
              Time zones, pay rules and retail tax are kept in each <Link to={routePaths.branches}>branch’s settings</Link>.
            </>
          ) : (
            'Branch settings are kept by the owner; tell them if anything here looks wrong.'
          )}
        </p>
      </div>
    </section>
  );
}
