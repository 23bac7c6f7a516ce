import { H1, H2, NonIdealState, Spinner } from '@blueprintjs/core';
import { CalendarIcon, ErrorIcon, PeopleIcon } from '@blueprintjs/icons';
import { type QueryClient, useQuery, useQueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { useEffect, useMemo, useState } from 'react';
import { data, Link, type LoaderFunctionArgs, useSearchParams } from 'react-router';
import { abilityFor, useAbility } from '../../../lib/ability';
import { errorMessage } from '../../../lib/api-error';
import { businessDateIn } from '../../../lib/business-date';
import { routePaths } from '../../../lib/route-paths';
import { requireUser, useSessionUser } from '../../../lib/session';
import { type PayPeriod, type PayPeriods, type PayrollLine, type PayrollRun, payrollRunKeys, payrollRunQueries } from '../api/payroll-run-queries';
import { LineDetailDrawer } from '../components/line-detail-drawer';
import { PayrollSections } from '../components/payroll-sections';
import { ReviewGrid } from '../components/review-grid';
import { ReviewSummary } from '../components/review-summary';
import { totalsOf } from '../components/review-figures';
import { periodText } from '../components/run-dates';
import { RunPanel } from '../components/run-panel';
import { RunPayNote } from '../components/run-pay-note';
import { RunMissingPeriod, RunPeriodChooser } from '../components/run-period-chooser';
import { choosePeriod } from '../components/run-periods';
import '../components/run-review.css';

export function payrollLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const user = await requireUser(request);
    if (!abilityFor(user).can('read', 'PayrollRun')) throw data({ message: 'Payroll is for the owner, the accountant and branch managers.' }, { status: 403 });
    const periods = await queryClient.ensureQueryData(payrollRunQueries.periods());
    const chosen = choosePeriod(periods, new URL(request.url).searchParams.get('period'));
    if (chosen?.runId) await queryClient.ensureQueryData(payrollRunQueries.run(chosen.runId));
    return null;
  };
}

export function PayrollRoute() {
  const { data: periods } = useSuspenseQuery(payrollRunQueries.periods());
  const ability = useAbility();
  const [search, setSearch] = useSearchParams();
  const chosen = choosePeriod(periods, search.get('period'));
  const choose = (periodId: string) => setSearch({ period: periodId });
  const mayCreatePeriod = ability.can('create', 'PaySchedule');

  return (
    <section className="tr-page tr-payroll-page">
      <PayrollSections />
      <header className="tr-page-header">
        <div>
          <H1 className="tr-page-title">Payroll</H1>
          <p className="tr-muted">{chosen ? `Pay period ${periodText(chosen.startDate, chosen.endDate)}` : 'Run, review and approve each pay period.'}</p>
        </div>
        {chosen && <RunPeriodChooser periods={periods} chosen={chosen} onChoose={choose} />}
      </header>
      {periods.schedule === null ? (
        <NonIdealState
          icon={<CalendarIcon />}
          title="No pay schedule yet"
          description={
            ability.can('update', 'PaySchedule') ? (
              <>
                Set how often staff are paid under <Link to={routePaths.payrollPlans}>Plans</Link> first.
              </>
            ) : (
              'The owner sets how often staff are paid; payroll runs start after that.'
            )
          }
        />
      ) : (
        <>
          <RunMissingPeriod periods={periods} mayCreate={mayCreatePeriod} onCreated={choose} />
          {chosen ? (
            <PeriodPayroll key={chosen.id} period={chosen} periods={periods} />
          ) : (
            <NonIdealState icon={<CalendarIcon />} title="No pay periods yet" description="Once a pay period is set up, its payroll is run here." />
          )}
        </>
      )}
    </section>
  );
}

function PeriodPayroll({ period, periods }: { period: PayPeriod; periods: PayPeriods }) {
  const ability = useAbility();
  const user = useSessionUser();
  const queryClient = useQueryClient();
  const [started, setStarted] = useState<PayrollRun | null>(null);
  const runId = started?.id ?? period.runId;
  const run = useQuery({ ...payrollRunQueries.run(runId ?? ''), enabled: runId !== null });
  const current = runId ? (run.data ?? null) : null;
  const reviewable = current !== null && (current.status === 'draft' || current.status === 'approved' || current.status === 'exported');
  const lines = useQuery({ ...payrollRunQueries.lines(current?.id ?? ''), enabled: reviewable });
  const [open, setOpen] = useState<PayrollLine | null>(null);
  const reviewed = useMemo(
    () =>
      lines.data
        ? { staff: lines.data.length, grossPay: totalsOf(lines.data).grossPay, names: new Map(lines.data.map((line) => [line.staffId, line.staffName])) }
        : null,
    [lines.data],
  );

  // The period list shows each run's status: refresh it once the run moves on.
  const listed = periods.periods.find((p) => p.id === period.id)?.runStatus;
  useEffect(() => {
    if (current && current.status !== listed) void queryClient.invalidateQueries({ queryKey: payrollRunKeys.periods() });
  }, [current, listed, queryClient]);

  if (run.isError) return <NonIdealState icon={<ErrorIcon />} title="The run could not be loaded" description={errorMessage(run.error)} />;
  if (runId && run.isPending) return <Spinner aria-label="Loading the run" />;
  const timeZone = user?.branches[0]?.timeZone ?? 'UTC';
  return (
    <div className="tr-run-layout">
      <RunPanel
        periodId={period.id}
        period={period}
        run={current}
        reviewed={reviewed}
        may={{
          run: ability.can('create', 'PayrollRun'),
          approve: ability.can('update', 'PayrollRun'),
          download: ability.can('update', 'PayrollRun'),
          sendStatements: ability.can('update', 'PayrollRun'),
        }}
        timeZone={timeZone}
        periodOpen={businessDateIn(timeZone) <= period.endDate}
        onStarted={setStarted}
      />
      {reviewable && (
        <section aria-labelledby="review-title" className="tr-run-review">
          <H2 id="review-title" className="tr-run-review-title">
            Review
          </H2>
          <RunPayNote />
          {lines.isPending ? (
            <p className="tr-muted">Loading the pay lines…</p>
          ) : lines.isError ? (
            <NonIdealState icon={<ErrorIcon />} title="The pay lines could not be loaded" description={errorMessage(lines.error)} />
          ) : lines.data.length === 0 ? (
            <NonIdealState
              icon={<PeopleIcon />}
              title="No pay lines to show"
              description={
                user?.role !== 'manager'
                  ? 'Nobody had hours, services or sales on closed days in this period.'
                  : current.status === 'draft'
                    ? 'Nobody at your branches had hours, services or sales on closed days in this period.'
                    : 'Approved payroll is with the owner and the accountant; managers review the drafts of their branches.'
              }
            />
          ) : (
            <>
              <ReviewSummary lines={lines.data} />
              <ReviewGrid lines={lines.data} onOpen={setOpen} />
            </>
          )}
        </section>
      )}
      <LineDetailDrawer line={open} period={period} onClose={() => setOpen(null)} />
    </div>
  );
}
