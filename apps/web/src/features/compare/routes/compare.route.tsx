import { AnchorButton, Button, H1, H2, Intent, NonIdealState } from '@blueprintjs/core';
import { DocumentIcon, DownloadIcon, OfficeIcon } from '@blueprintjs/icons';
import { type QueryClient, useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { data, generatePath, Link, type LoaderFunctionArgs, useSearchParams } from 'react-router';
import { abilityFor } from '../../../lib/ability';
import { errorMessage } from '../../../lib/api-error';
import { routePaths } from '../../../lib/route-paths';
import { requireUser, useSessionUser } from '../../../lib/session';
import { showToast } from '../../../lib/toaster';
import { compareQueries } from '../api/compare-queries';
import { useDownloadCompareWorkbook } from '../api/use-download-compare-workbook';
import { revenueTrend } from '../components/chart-data';
import { BranchBarChart, RevenueTrendChart } from '../components/comparison-charts';
import { ComparisonTable } from '../components/comparison-table';
import { type CompareRange, rangeSearch, readRange } from '../components/compare-range';
import { canCompare, todayFor } from '../components/compare-access';
import { daysIn } from '../components/date-ranges';
import { glossaryOf } from '../components/figure-columns';
import { rangeText } from '../components/figure-format';
import { RangePicker } from '../components/range-picker';
import '../components/compare.css';

export function compareLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const user = await requireUser(request);
    if (!canCompare(abilityFor(user))) throw data({ message: 'Comparing branches is for the owner, the accountant and branch managers.' }, { status: 403 });
    const range = readRange(new URL(request.url).searchParams, todayFor(user.branches));
    // The pay calendar only feeds one preset: the page opens without it.
    void queryClient.prefetchQuery(compareQueries.payCalendar());
    await Promise.all([
      queryClient.ensureQueryData(compareQueries.branches(range)),
      queryClient.ensureQueryData(compareQueries.trend(range)),
      queryClient.ensureQueryData(compareQueries.definitions()),
    ]);
    return null;
  };
}

export function CompareRoute() {
  const user = useSessionUser();
  const [search, setSearch] = useSearchParams();
  const today = todayFor(user?.branches ?? []);
  const range = readRange(search, today);
  const { data: comparison } = useSuspenseQuery(compareQueries.branches(range));
  const { data: trend } = useSuspenseQuery(compareQueries.trend(range));
  const { data: definitions } = useSuspenseQuery(compareQueries.definitions());
  const { data: calendar } = useQuery(compareQueries.payCalendar());
  const glossary = glossaryOf(definitions.figures);
  const download = useDownloadCompareWorkbook();

  const choose = (next: CompareRange) => setSearch(new URLSearchParams(rangeSearch(next)));
  const everyBranch = user?.role === 'owner' || user?.role === 'accountant';
  const branchHref = (branchId: string) => `${generatePath(routePaths.compareBranch, { branchId })}${rangeSearch(range)}`;

  const exportTable = () =>
    download.mutate(
      { kind: 'comparison', range },
      {
        onSuccess: (fileName) => void showToast({ intent: Intent.SUCCESS, message: `Saved ${fileName}.` }),
        onError: (error) => void showToast({ intent: Intent.DANGER, message: errorMessage(error) }),
      },
    );

  return (
    <section className="tr-page tr-compare">
      <header className="tr-page-header">
        <div>
          <H1 className="tr-page-title">Compare branches</H1>
          <p className="tr-muted">
            {everyBranch ? 'Every branch' : 'Your branches'} · {rangeText(range.from, range.to)} · {daysIn(range)} {daysIn(range) === 1 ? 'day' : 'days'}
          </p>
        </div>
        <div className="tr-compare-actions">
          <Link to={routePaths.compareFees} className="tr-compare-link">
            <DocumentIcon /> Franchise fees
          </Link>
          <Button icon={<DownloadIcon />} text="Download XLSX" loading={download.isPending} onClick={exportTable} disabled={comparison.rows.length === 0} />
        </div>
      </header>

      <RangePicker range={range} today={today} calendar={calendar} onChange={choose} withRebooking />

      {comparison.rows.length === 0 ? (
        <NonIdealState
          icon={<OfficeIcon />}
          title="No branch to compare"
          description="There are no branches you may see yet. Ask the owner to assign you to a branch."
          action={everyBranch ? <AnchorButton href={routePaths.branches} text="Branch settings" /> : undefined}
        />
      ) : (
        <>
          <section className="tr-compare-section" aria-labelledby="compare-table-title">
            <H2 id="compare-table-title" className="tr-section-title">
              Figures by branch
            </H2>
            <p className="tr-muted tr-section-note">
              Choose a branch’s name to see its days and stylists. Point at a column name, or open “What the figures mean” below the table, for how each figure is counted.
            </p>
            <ComparisonTable rows={comparison.rows} totals={comparison.totals} glossary={glossary} branchHref={branchHref} />
          </section>

          <section className="tr-compare-section" aria-labelledby="compare-charts-title">
            <H2 id="compare-charts-title" className="tr-section-title">
              Charts
            </H2>
            <RevenueTrendChart trend={revenueTrend(trend, range, calendar?.workweekStartsOn ?? 0)} />
            <div className="tr-chart-pair">
              <BranchBarChart figure="colourCostShare" rows={comparison.rows} totals={comparison.totals} />
              <BranchBarChart figure="averageTicket" rows={comparison.rows} totals={comparison.totals} />
            </div>
          </section>
        </>
      )}
    </section>
  );
}
