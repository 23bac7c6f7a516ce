import { Callout, FormGroup, H1, H2, HTMLSelect, Intent, NonIdealState } from '@blueprintjs/core';
import { ArrowLeftIcon, OfficeIcon } from '@blueprintjs/icons';
import { type QueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { data, Link, type LoaderFunctionArgs, useSearchParams } from 'react-router';
import { abilityFor } from '../../../lib/ability';
import { errorMessage } from '../../../lib/api-error';
import { routePaths } from '../../../lib/route-paths';
import { requireUser, useSessionUser } from '../../../lib/session';
import { showToast } from '../../../lib/toaster';
import { compareQueries } from '../api/compare-queries';
import { useDownloadCompareWorkbook } from '../api/use-download-compare-workbook';
import { canCompare, todayFor } from '../components/compare-access';
import { monthBefore, recentMonths } from '../components/date-ranges';
import { FeeStatement } from '../components/fee-statement';
import { glossaryOf } from '../components/figure-columns';
import { monthText } from '../components/figure-format';
import '../components/compare.css';

const MONTHS_OFFERED = 24;

/** `?month=YYYY-MM` when it is one of the months offered; otherwise last month, the one a statement is usually wanted for. */
function chooseMonth(search: URLSearchParams, today: string): { month: string; months: string[] } {
  const months = recentMonths(today, MONTHS_OFFERED);
  const asked = search.get('month');
  return { month: asked && months.includes(asked) ? asked : monthBefore(today.slice(0, 7)), months };
}

export function compareFeesLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const user = await requireUser(request);
    if (!canCompare(abilityFor(user))) throw data({ message: 'Fee statements are for the owner, the accountant and branch managers.' }, { status: 403 });
    const { month } = chooseMonth(new URL(request.url).searchParams, todayFor(user.branches));
    await Promise.all([queryClient.ensureQueryData(compareQueries.fees(month)), queryClient.ensureQueryData(compareQueries.definitions())]);
    return null;
  };
}

export function CompareFeesRoute() {
  const user = useSessionUser();
  const [search, setSearch] = useSearchParams();
  const { month, months } = chooseMonth(search, todayFor(user?.branches ?? []));
  const { data: statements } = useSuspenseQuery(compareQueries.fees(month));
  const { data: definitions } = useSuspenseQuery(compareQueries.definitions());
  const glossary = glossaryOf(definitions.fees);
  const download = useDownloadCompareWorkbook();

  const downloadFor = (branchId: string) =>
    download.mutate(
      { kind: 'fees', branchId, month },
      {
        onSuccess: (fileName) => void showToast({ intent: Intent.SUCCESS, message: `Saved ${fileName}.` }),
        onError: (error) => void showToast({ intent: Intent.DANGER, message: errorMessage(error) }),
      },
    );
  const downloading = (branchId: string) => download.isPending && download.variables?.kind === 'fees' && download.variables.branchId === branchId;

  return (
    <section className="tr-page tr-compare">
      <Link to={routePaths.compare} className="tr-compare-back">
        <ArrowLeftIcon /> Compare branches
      </Link>
      <header className="tr-page-header">
        <div>
          <H1 className="tr-page-title">Franchise fees</H1>
          <p className="tr-muted">
            Each branch’s royalty and marketing-fund fees for {monthText(month)}, at the rates in its branch settings.
          </p>
        </div>
        <FormGroup label="Month" labelFor="fees-month" inline className="tr-fees-month">
          <HTMLSelect id="fees-month" value={month} onChange={(event) => setSearch({ month: event.currentTarget.value })}>
            {months.map((m) => (
              <option key={m} value={m}>
                {monthText(m)}
              </option>
            ))}
          </HTMLSelect>
        </FormGroup>
      </header>

      {statements.rows.length === 0 ? (
        <NonIdealState icon={<OfficeIcon />} title="No branch statements" description="There are no branches you may see yet." />
      ) : (
        <>
          <div className="tr-fee-grid">
            {statements.rows.map((row) => (
              <FeeStatement
                key={row.branchId ?? row.branchName}
                row={row}
                month={month}
                glossary={glossary}
                downloading={row.branchId !== null && downloading(row.branchId)}
                onDownload={row.branchId === null ? undefined : () => downloadFor(row.branchId as string)}
              />
            ))}
          </div>
          {statements.rows.length > 1 && (
            <div className="tr-fee-grid">
              <FeeStatement row={{ ...statements.totals, branchName: 'All branches' }} month={month} glossary={glossary} />
            </div>
          )}
          <Callout intent={Intent.WARNING} className="tr-fee-note" title="Before invoicing or paying">
            {statements.note}
          </Callout>
          <section className="tr-fee-definitions" aria-labelledby="fee-definitions-title">
            <H2 id="fee-definitions-title" className="tr-panel-title">
              How the fees are worked out
            </H2>
            <dl className="tr-definition-list">
              {definitions.fees.map((figure) => (
                <div key={figure.figure}>
                  <dt>{figure.label}</dt>
                  <dd>{figure.definition}</dd>
                </div>
              ))}
            </dl>
          </section>
        </>
      )}
    </section>
  );
}
