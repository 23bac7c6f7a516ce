import { subject } from '@casl/ability';
import { Button, Callout, H1, HTMLSelect, Intent, NonIdealState } from '@blueprintjs/core';
import { CalendarIcon, LockIcon, OfficeIcon, UploadIcon } from '@blueprintjs/icons';
import { type QueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { data, type LoaderFunctionArgs, useSearchParams } from 'react-router';
import { abilityFor, useAbility } from '../../../lib/ability';
import { businessDateIn } from '../../../lib/business-date';
import { requireUser, useSessionUser } from '../../../lib/session';
import { type PayPeriod, payrollRunQueries } from '../api/payroll-run-queries';
import { timesheetQueries } from '../api/timesheet-queries';
import { gridRows, timesheetTemplate } from '../components/hours-figures';
import { HoursGrid } from '../components/hours-grid';
import { HoursUploadDialog } from '../components/hours-upload-dialog';
import { PayrollSections } from '../components/payroll-sections';
import { daysOf, periodText } from '../components/run-dates';
import { RunMissingPeriod, RunPeriodChooser } from '../components/run-period-chooser';
import { choosePeriod } from '../components/run-periods';
import '../components/hours.css';

type Branch = { id: string; name: string; timeZone: string };

const chooseBranch = (branches: Branch[], asked: string | null): Branch | null => branches.find((b) => b.id === asked) ?? branches[0] ?? null;

export function hoursLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const user = await requireUser(request);
    if (!abilityFor(user).can('read', 'Timesheet')) throw data({ message: 'Hours are entered by branch managers and the owner.' }, { status: 403 });
    const search = new URL(request.url).searchParams;
    const periods = await queryClient.ensureQueryData(payrollRunQueries.periods());
    const period = choosePeriod(periods, search.get('period'));
    const branch = chooseBranch(user.branches, search.get('branch'));
    if (period && branch) {
      await Promise.all([queryClient.ensureQueryData(timesheetQueries.entries(period.id)), queryClient.ensureQueryData(timesheetQueries.staff(branch.id))]);
    }
    return null;
  };
}

export function HoursRoute() {
  const user = useSessionUser();
  const ability = useAbility();
  const { data: periods } = useSuspenseQuery(payrollRunQueries.periods());
  const [search, setSearch] = useSearchParams();
  const period = choosePeriod(periods, search.get('period'));
  const branch = user ? chooseBranch(user.branches, search.get('branch')) : null;
  const choose = (changes: { period?: string; branch?: string }) =>
    setSearch((current) => {
      const next = new URLSearchParams(current);
      for (const [name, value] of Object.entries(changes)) next.set(name, value);
      return next;
    });

  return (
    <section className="tr-page tr-hours-page">
      <PayrollSections />
      <header className="tr-page-header">
        <div>
          <H1 className="tr-page-title">Hours</H1>
          <p className="tr-muted">{period && branch ? `${branch.name} · pay period ${periodText(period.startDate, period.endDate)}` : 'Hours worked, by staff member and day.'}</p>
        </div>
        <div className="tr-hours-controls">
          {user && user.branches.length > 1 && branch && (
            <HTMLSelect aria-label="Branch" value={branch.id} onChange={(event) => choose({ branch: event.currentTarget.value })}>
              {user.branches.map((b) => (
                <option key={b.id} value={b.id}>
                  {b.name}
                </option>
              ))}
            </HTMLSelect>
          )}
          {period && <RunPeriodChooser periods={periods} chosen={period} onChoose={(id) => choose({ period: id })} />}
        </div>
      </header>
      <RunMissingPeriod periods={periods} mayCreate={ability.can('create', 'PaySchedule')} onCreated={(id) => choose({ period: id })} />
      {!branch ? (
        <NonIdealState icon={<OfficeIcon />} title="No branch yet" description="Ask the owner to assign you to a branch." />
      ) : !period ? (
        <NonIdealState icon={<CalendarIcon />} title="No pay periods yet" description="Hours are entered into a pay period; once one is set up, its days appear here." />
      ) : (
        <PeriodHours key={`${period.id}-${branch.id}`} period={period} branch={branch} />
      )}
    </section>
  );
}

function PeriodHours({ period, branch }: { period: PayPeriod; branch: Branch }) {
  const ability = useAbility();
  const user = useSessionUser();
  const { data: entries } = useSuspenseQuery(timesheetQueries.entries(period.id));
  const { data: staff } = useSuspenseQuery(timesheetQueries.staff(branch.id));
  const [uploading, setUploading] = useState(false);
  const rows = useMemo(() => gridRows(staff, entries, branch.id), [staff, entries, branch.id]);
  const days = useMemo(() => daysOf(period.startDate, period.endDate), [period.startDate, period.endDate]);
  const today = businessDateIn(branch.timeZone);
  const frozen = period.runStatus === 'approved' || period.runStatus === 'exported';
  const editable = !frozen && ability.can('update', subject('Timesheet', { organisationId: user?.organisationId, branchId: branch.id }));
  const names = useMemo(
    () => new Map<string, string>([...rows.map((row): [string, string] => [row.staffId, row.staffName]), ...(user?.branches ?? []).map((b): [string, string] => [b.id, b.name])]),
    [rows, user],
  );

  return (
    <div className="tr-hours-layout">
      {frozen && (
        <Callout intent={Intent.SUCCESS} icon={<LockIcon />} title="This period’s payroll is approved">
          Its hours are frozen with the figures and can no longer change.
        </Callout>
      )}
      {editable && (
        <div className="tr-hours-toolbar">
          <Button icon={<UploadIcon />} text="Upload a timesheet…" onClick={() => setUploading(true)} />
          <span className="tr-muted">A .csv or .xlsx file: every row is checked first, and nothing is saved unless all of them are good.</span>
        </div>
      )}
      {rows.length === 0 ? (
        <NonIdealState icon={<OfficeIcon />} title="Nobody works here yet" description={`${branch.name} has no active staff and no hours in this period.`} />
      ) : (
        <HoursGrid periodId={period.id} branchId={branch.id} rows={rows} days={days} today={today} editable={editable} />
      )}
      <HoursUploadDialog
        isOpen={uploading}
        periodId={period.id}
        period={periodText(period.startDate, period.endDate)}
        names={names}
        template={() => timesheetTemplate(rows, branch.id, days.filter((day) => day <= today))}
        templateName={`hours-${branch.name.toLowerCase().replaceAll(/[^a-z0-9]+/g, '-')}-${period.startDate}.csv`}
        onClose={() => setUploading(false)}
      />
    </div>
  );
}
