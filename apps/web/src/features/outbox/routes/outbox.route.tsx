import { Button, H1, NonIdealState } from '@blueprintjs/core';
import { EnvelopeIcon } from '@blueprintjs/icons';
import { type QueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { data, type LoaderFunctionArgs, useSearchParams } from 'react-router';
import { abilityFor } from '../../../lib/ability';
import { requireUser, useSessionUser } from '../../../lib/session';
import { outboxQueries } from '../api/outbox-queries';
import { MessageDrawer } from '../components/message-drawer';
import { OutboxPager } from '../components/outbox-pager';
import { OutboxTable } from '../components/outbox-table';
import '../components/outbox.css';

const pageOf = (params: URLSearchParams): number => {
  const page = Number.parseInt(params.get('page') ?? '1', 10);
  return Number.isFinite(page) && page > 0 ? page : 1;
};

export function outboxLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const user = await requireUser(request);
    if (!abilityFor(user).can('read', 'OutboundMessage')) throw data({ message: 'The outbox is kept for the owner and the accountant.' }, { status: 403 });
    await queryClient.ensureQueryData(outboxQueries.page(pageOf(new URL(request.url).searchParams)));
    return null;
  };
}

export function OutboxRoute() {
  const [params, setParams] = useSearchParams();
  const page = pageOf(params);
  const { data: outbox } = useSuspenseQuery(outboxQueries.page(page));
  const branch = useSessionUser()?.branches[0];
  const timeZone = branch?.timeZone ?? Intl.DateTimeFormat().resolvedOptions().timeZone;
  const [chosenId, setChosenId] = useState<string | null>(null);
  const selected = outbox.messages.find((m) => m.id === chosenId) ?? null;
  const goTo = (next: number) => {
    setChosenId(null);
    setParams(next > 1 ? { page: String(next) } : {});
  };

  return (
    <section className="tr-page tr-outbox">
      <header className="tr-page-header">
        <div>
          <H1 className="tr-page-title">Outbox</H1>
          <p className="tr-muted">
            Mail Tressury has sent, newest first, and any it could not send with the reason. Open a message to read it as it was sent.
            {branch ? ` Times on ${branch.name}’s clock (${timeZone.replaceAll('_', ' ')}).` : ''}
          </p>
        </div>
      </header>
      {outbox.messages.length === 0 && page > 1 ? (
        <NonIdealState
          icon={<EnvelopeIcon />}
          title="Nothing on this page"
          description="The outbox is shorter than this page number."
          action={<Button text="Back to the newest mail" onClick={() => goTo(1)} />}
        />
      ) : outbox.messages.length === 0 ? (
        <NonIdealState
          icon={<EnvelopeIcon />}
          title="Nothing sent yet"
          description="Mail the app sends, such as pay statements from an approved payroll run, is listed here with whether it went out."
        />
      ) : (
        <>
          <OutboxTable messages={outbox.messages} selectedId={selected?.id ?? null} timeZone={timeZone} onSelect={setChosenId} onClose={() => setChosenId(null)} />
          <OutboxPager page={page} hasMore={outbox.hasMore} onPage={goTo} />
          <MessageDrawer message={selected} timeZone={timeZone} onClose={() => setChosenId(null)} />
        </>
      )}
    </section>
  );
}
