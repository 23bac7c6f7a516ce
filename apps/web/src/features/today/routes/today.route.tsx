import { Button, Callout, H1, HTMLSelect, InputGroup, Intent, NonIdealState, useHotkeys } from '@blueprintjs/core';
import { LockIcon, OfficeIcon, PlusIcon, PropertiesIcon } from '@blueprintjs/icons';
import { type QueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { data, type LoaderFunctionArgs, useSearchParams } from 'react-router';
import { abilityFor, useAbility } from '../../../lib/ability';
import { businessDateText, chooseBranchDay } from '../../../lib/business-date';
import { requireUser, useSessionUser } from '../../../lib/session';
import { todayQueries } from '../api/today-queries';
import { OpenTicketDialog } from '../components/open-ticket-dialog';
import { TicketTable } from '../components/ticket-table';
import '../components/today.css';

export function todayLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const user = await requireUser(request);
    if (!abilityFor(user).can('read', 'Ticket')) throw data({ message: 'The day’s tickets are for the salon floor and the managers.' }, { status: 403 });
    const day = chooseBranchDay(user.branches, new URL(request.url).searchParams);
    if (day) await queryClient.ensureQueryData(todayQueries.tickets(day.branch.id, day.date));
    return null;
  };
}

export function TodayRoute() {
  const user = useSessionUser();
  const [search, setSearch] = useSearchParams();
  const day = user ? chooseBranchDay(user.branches, search) : null;
  if (!day) {
    return <NonIdealState icon={<OfficeIcon />} title="No branch yet" description="Ask the owner to assign you to a branch." />;
  }
  const choose = (changes: { branch?: string; date?: string }) =>
    setSearch((current) => {
      const next = new URLSearchParams(current);
      for (const [name, value] of Object.entries(changes)) next.set(name, value);
      return next;
    });
  return <TodayPage key={`${day.branch.id}-${day.date}`} {...day} branches={user?.branches ?? []} ownWorkOnly={user?.role === 'stylist'} onChoose={choose} />;
}

type PageProps = {
  branch: { id: string; name: string; timeZone: string };
  branches: { id: string; name: string }[];
  date: string;
  today: string;
  /** A stylist sees only the tickets she works on (the API filters them). */
  ownWorkOnly: boolean;
  onChoose: (changes: { branch?: string; date?: string }) => void;
};

function TodayPage({ branch, branches, date, today, ownWorkOnly, onChoose }: PageProps) {
  const { data: tickets } = useSuspenseQuery(todayQueries.tickets(branch.id, date));
  const ability = useAbility();
  const [opening, setOpening] = useState(false);
  const isToday = date === today;
  const dayClosed = tickets.some((t) => t.locked);
  const opens = isToday && !dayClosed && ability.can('create', 'Ticket');

  const hotkeys = useMemo(
    () => (opens ? [{ combo: 'n', global: true, label: 'Open a ticket', onKeyDown: () => setOpening(true) }] : []),
    [opens],
  );
  useHotkeys(hotkeys);

  return (
    <section className="tr-page tr-today">
      <header className="tr-page-header">
        <div>
          <H1 className="tr-page-title">{isToday ? 'Today' : businessDateText(date)}</H1>
          <p className="tr-muted">
            {branch.name} · {businessDateText(date)}
            {isToday ? '' : ' · a past day, read only'}
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
          <InputGroup
            type="date"
            aria-label="Business date"
            className="tr-date-input"
            value={date}
            max={today}
            onValueChange={(value) => value && onChoose({ date: value })}
          />
          {!isToday && <Button text="Back to today" onClick={() => onChoose({ date: today })} />}
          {opens && <Button intent={Intent.PRIMARY} icon={<PlusIcon />} text="Open a ticket" onClick={() => setOpening(true)} />}
        </div>
      </header>
      {dayClosed && (
        <Callout icon={<LockIcon />} className="tr-banner">
          {isToday ? 'Today is closed at this branch' : 'This day is closed'}: its tickets are locked. Corrections go in as dated adjustments on a later open day.
        </Callout>
      )}
      {tickets.length === 0 ? (
        <NonIdealState
          icon={<PropertiesIcon />}
          title={isToday ? 'No tickets yet today' : 'No tickets on this day'}
          description={opens ? 'Open a ticket when a client arrives (or press N).' : ownWorkOnly ? 'Tickets with your services appear here.' : undefined}
          action={opens ? <Button intent={Intent.PRIMARY} icon={<PlusIcon />} text="Open a ticket" onClick={() => setOpening(true)} /> : undefined}
        />
      ) : (
        <TicketTable tickets={tickets} timeZone={branch.timeZone} />
      )}
      <OpenTicketDialog isOpen={opening} branch={branch} onClose={() => setOpening(false)} />
    </section>
  );
}
