import { H1, H2 } from '@blueprintjs/core';
import { ArrowLeftIcon } from '@blueprintjs/icons';
import { type QueryClient, useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { data, Link, type LoaderFunctionArgs, useParams, useSearchParams } from 'react-router';
import { abilityFor } from '../../../lib/ability';
import { businessDateIn } from '../../../lib/business-date';
import { routePaths } from '../../../lib/route-paths';
import { requireUser, useSessionUser } from '../../../lib/session';
import { compareQueries } from '../api/compare-queries';
import { DaysTable, StylistsTable } from '../components/breakdown-tables';
import { revenueTrend } from '../components/chart-data';
import { RevenueTrendChart } from '../components/comparison-charts';
import { canCompare, todayFor } from '../components/compare-access';
import { type CompareRange, rangeSearch, readRange } from '../components/compare-range';
import { daysIn } from '../components/date-ranges';
import { glossaryOf } from '../components/figure-columns';
import { rangeText } from '../components/figure-format';
import { RangePicker } from '../components/range-picker';
import '../components/compare.css';

/** Today at this branch when the person works there; otherwise in their first branch's zone. */
function branchToday(branches: { id: string; timeZone: string }[], branchId: string): string {
  const branch = branches.find((b) => b.id === branchId);
  return branch ? businessDateIn(branch.timeZone) : todayFor(branches);
}

export function compareBranchLoader(queryClient: QueryClient) {
  return async ({ request, params }: LoaderFunctionArgs) => {
    const user = await requireUser(request);
    if (!canCompare(abilityFor(user))) throw data({ message: 'Comparing branches is for the owner, the accountant and branch managers.' }, { status: 403 });
    const branchId = params.branchId ?? '';
    const range = readRange(new URL(request.url).searchParams, branchToday(user.branches, branchId));
    void queryClient.prefetchQuery(compareQueries.payCalendar());
    await Promise.all([
      queryClient.ensureQueryData(compareQueries.days(branchId, range)),
      queryClient.ensureQueryData(compareQueries.stylists(branchId, range)),
      queryClient.ensureQueryData(compareQueries.trend(range)),
      queryClient.ensureQueryData(compareQueries.definitions()),
    ]);
    return null;
  };
}

export function CompareBranchRoute() {
  const { branchId = '' } = useParams();
  const user = useSessionUser();
  const [search, setSearch] = useSearchParams();
  const today = branchToday(user?.branches ?? [], branchId);
  const range = readRange(search, today);
  const { data: days } = useSuspenseQuery(compareQueries.days(branchId, range));
  const { data: stylists } = useSuspenseQuery(compareQueries.stylists(branchId, range));
  const { data: trend } = useSuspenseQuery(compareQueries.trend(range));
  const { data: definitions } = useSuspenseQuery(compareQueries.definitions());
  const { data: calendar } = useQuery(compareQueries.payCalendar());
  const glossary = glossaryOf(definitions.figures);

  const choose = (next: CompareRange) => setSearch(new URLSearchParams(rangeSearch(next)));
  const branch = days.branch;
  const ownTrend = { ...trend, series: trend.series.filter((series) => series.branchId === branchId) };

  return (
    <section className="tr-page tr-compare">
      <Link to={`${routePaths.compare}${rangeSearch(range)}`} className="tr-compare-back">
        <ArrowLeftIcon /> All branches
      </Link>
      <header className="tr-page-header">
        <div>
          <H1 className="tr-page-title">{branch.name}</H1>
          <p className="tr-muted">
            {rangeText(range.from, range.to)} · {daysIn(range)} {daysIn(range) === 1 ? 'day' : 'days'} · business dates in {branch.timeZone.replaceAll('_', ' ')} time
          </p>
        </div>
      </header>

      <RangePicker range={range} today={today} calendar={calendar} onChange={choose} />

      <RevenueTrendChart trend={revenueTrend(ownTrend, range, calendar?.workweekStartsOn ?? 0)} place={branch.name} />

      <section className="tr-compare-section" aria-labelledby="branch-days-title">
        <H2 id="branch-days-title" className="tr-section-title">
          Days
        </H2>
        <DaysTable rows={days.rows} glossary={glossary} />
      </section>

      <section className="tr-compare-section" aria-labelledby="branch-stylists-title">
        <H2 id="branch-stylists-title" className="tr-section-title">
          Stylists
        </H2>
        <StylistsTable rows={stylists.rows} glossary={glossary} />
      </section>
    </section>
  );
}
