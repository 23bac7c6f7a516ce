import { Callout, H1, Intent, Tag } from '@blueprintjs/core';
import { ArrowLeftIcon, BanCircleIcon, LockIcon, WarningSignIcon } from '@blueprintjs/icons';
import { Link } from 'react-router';
import { branchTimeText, businessDateText } from '../../../lib/business-date';
import type { Ticket } from '../api/ticket-queries';

export const ticketStates: Record<Ticket['status'], { text: string; intent: Intent }> = {
  open: { text: 'Open', intent: Intent.PRIMARY },
  closed: { text: 'Closed', intent: Intent.SUCCESS },
  void: { text: 'Void', intent: Intent.NONE },
};

/** One sentence on the client's patch test, for the header and the safety panel. */
export function patchTestNote(ticket: Ticket, timeZone: string): string {
  const { patchTest, client } = ticket;
  const last = !client
    ? 'A walk-in has no client record, so no patch test is on record'
    : patchTest.lastPatchTestOn
      ? `The last patch test on record is from ${businessDateText(patchTest.lastPatchTestOn)}`
      : 'No patch test is on record';
  if (patchTest.needed && patchTest.acknowledgedAt) return `${last}; going ahead with colour was confirmed at ${branchTimeText(patchTest.acknowledgedAt, timeZone)}.`;
  if (patchTest.needed && patchTest.lastPatchTestOn) return `${last}, which does not cover colour today.`;
  return `${last}.`;
}

type Props = { ticket: Ticket; timeZone: string; backTo: string };

export function TicketHeader({ ticket, timeZone, backTo }: Props) {
  const state = ticketStates[ticket.status];
  const { client, patchTest } = ticket;
  return (
    <>
      <Link to={backTo} className="tr-back-link">
        <ArrowLeftIcon /> {ticket.branchName} · {businessDateText(ticket.businessDate)}
      </Link>
      <header className="tr-page-header tr-ticket-header">
        <div>
          <H1 className="tr-page-title">
            Ticket {ticket.number}{' '}
            <Tag intent={state.intent} minimal={ticket.status !== 'closed'} className="tr-state-tag">
              {state.text}
            </Tag>
            {ticket.refunded && (
              <Tag intent={Intent.WARNING} minimal className="tr-state-tag">
                Refund booked
              </Tag>
            )}
          </H1>
          <p className="tr-muted">
            {client ? client.name : 'Walk-in'} · opened {branchTimeText(ticket.openedAt, timeZone)}
            {ticket.closedAt ? ` · closed ${branchTimeText(ticket.closedAt, timeZone)}` : ''}
          </p>
        </div>
        <dl className="tr-client-facts" aria-label="Client">
          <dt>Allergies</dt>
          <dd>
            {client?.allergyNotes ? (
              <Tag intent={Intent.DANGER} minimal icon={<WarningSignIcon />} className="tr-wrap-tag">
                {client.allergyNotes}
              </Tag>
            ) : (
              <span className="tr-muted">{client ? 'None noted' : 'No client record'}</span>
            )}
          </dd>
          <dt>Patch test</dt>
          <dd>
            {patchTest.needed ? (
              <Tag intent={Intent.WARNING} minimal icon={<WarningSignIcon />}>
                {patchTest.acknowledgedAt ? 'Not current · confirmed' : 'Not current'}
              </Tag>
            ) : patchTest.lastPatchTestOn ? (
              businessDateText(patchTest.lastPatchTestOn)
            ) : (
              <span className="tr-muted">None on record</span>
            )}
          </dd>
        </dl>
      </header>
      {ticket.locked && (
        <Callout icon={<LockIcon />} title="This day is closed" className="tr-banner">
          The ticket is locked with its day. Corrections go in as dated adjustments on a later open day, from Close the day.
        </Callout>
      )}
      {ticket.status === 'void' && (
        <Callout icon={<BanCircleIcon />} title="Voided" className="tr-banner">
          {ticket.voidReason ?? 'No reason was given.'}
        </Callout>
      )}
    </>
  );
}
