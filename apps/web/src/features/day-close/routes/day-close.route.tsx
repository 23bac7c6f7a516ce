import { Button, H1, HTMLSelect, InputGroup, NonIdealState } from '@blueprintjs/core';
import { OfficeIcon } from '@blueprintjs/icons';
import { type QueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { data, type LoaderFunctionArgs, useSearchParams } from 'react-router';
import { abilityFor } from '../../../lib/ability';
import { businessDateText, chooseBranchDay } from '../../../lib/business-date';
import { requireUser, useSessionUser } from '../../../lib/session';
import { dayCloseQueries } from '../api/day-close-queries';
import { AdjustmentForm } from '../components/adjustment-form';
import { ClosedDayRecord } from '../components/closed-day-record';
import { DayChecklist } from '../components/day-checklist';
import { DayFigures } from '../components/day-figures';
import { ReconciliationForm } from '../components/reconciliation-form';
import '../components/day-close.css';

export function dayCloseLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const user = await requireUser(request);
    if (!abilityFor(user).can('create', 'DayClose')) throw data({ message: 'Closing the day is the manager’s (or the owner’s).' }, { status: 403 });
    const day = chooseBranchDay(user.branches, new URL(request.url).searchParams);
    if (day) await queryClient.ensureQueryData(dayCloseQueries.preview(day.branch.id, day.date));
    return null;
  };
}

export function DayCloseRoute() {
  const user = useSessionUser();
  const [search, setSearch] = useSearchParams();
  const day = user ? chooseBranchDay(user.branches, search) : null;
  if (!user || !day) return <NonIdealState icon={<OfficeIcon />} title="No branch yet" description="Ask the owner to assign you to a branch." />;
  const choose = (changes: { branch?: string; date?: string }) =>
    setSearch((current) => {
      const next = new URLSearchParams(current);
      for (const [name, value] of Object.entries(changes)) next.set(name, value);
      return next;
    });
  return <DayClosePage key={`${day.branch.id}-${day.date}`} {...day} branches={user.branches} onChoose={choose} />;
}

type PageProps = {
  branch: { id: string; name: string; timeZone: string };
  branches: { id: string; name: string }[];
  date: string;
  today: string;
  onChoose: (changes: { branch?: string; date?: string }) => void;
};

function DayClosePage({ branch, branches, date, today, onChoose }: PageProps) {
  const { data: preview } = useSuspenseQuery(dayCloseQueries.preview(branch.id, date));
  return (
    <section className="tr-page tr-day-close">
      <header className="tr-page-header">
        <div>
          <H1 className="tr-page-title">Close the day</H1>
          <p className="tr-muted">
            {branch.name} · {businessDateText(date)}
            {preview.close ? ' · closed' : date === today ? ' · open' : ' · not closed yet'}
          </p>
        </div>
        <div className="tr-day-controls">
          {branches.length > 1 && (
            <HTMLSelect aria-label="Branch" value={branch.id} onChange={(event) => onChoose({ branch: event.currentTarget.value })}>
              {branches.map((b) => (
                <option key={b.id} value={b.id}>
                  {b.name}
                </option>
              ))}
            </HTMLSelect>
          )}
          <InputGroup type="date" aria-label="Business date" className="tr-date-input" value={date} max={today} onValueChange={(value) => value && onChoose({ date: value })} />
          {date !== today && <Button text="Back to today" onClick={() => onChoose({ date: today })} />}
        </div>
      </header>
      <div className="tr-day-grid">
        <div className="tr-day-main">
          {preview.close ? (
            <ClosedDayRecord close={preview.close} timeZone={branch.timeZone} />
          ) : (
            <>
              <DayChecklist preview={preview} />
              <ReconciliationForm preview={preview} />
            </>
          )}
          <AdjustmentForm branch={branch} today={today} todayClosed={date === today && preview.close !== null} />
        </div>
        <DayFigures preview={preview} />
      </div>
    </section>
  );
}
