import { HTMLTable, Intent, Tag } from '@blueprintjs/core';
import { LockIcon, TintIcon } from '@blueprintjs/icons';
import { sumMoney } from '@tressury/domain';
import { generatePath, Link } from 'react-router';
import { branchTimeText } from '../../../lib/business-date';
import { routePaths } from '../../../lib/route-paths';
import type { TicketSummary } from '../api/today-queries';

const states: Record<TicketSummary['status'], { text: string; intent: Intent }> = {
  open: { text: 'Open', intent: Intent.PRIMARY },
  closed: { text: 'Closed', intent: Intent.SUCCESS },
  void: { text: 'Void', intent: Intent.NONE },
};

export function TicketTable({ tickets, timeZone }: { tickets: TicketSummary[]; timeZone: string }) {
  // Voided tickets count for nothing; the day's sums are of the others.
  const counted = tickets.filter((t) => t.status !== 'void');
  const sum = (pick: (t: TicketSummary) => string) => sumMoney(counted.map(pick));
  return (
    <div className="tr-table-frame">
      <HTMLTable compact striped className="tr-table tr-today-table" aria-label="Tickets">
        <thead>
          <tr>
            <th scope="col" className="tr-figure">
              No.
            </th>
            <th scope="col">Opened</th>
            <th scope="col">Client</th>
            <th scope="col">Stylists</th>
            <th scope="col" className="tr-figure">
              Services
            </th>
            <th scope="col" className="tr-figure">
              Total
            </th>
            <th scope="col" className="tr-figure">
              Paid
            </th>
            <th scope="col" className="tr-figure">
              Due
            </th>
            <th scope="col">State</th>
            <th scope="col">Colour</th>
          </tr>
        </thead>
        <tbody>
          {tickets.map((ticket) => {
            const state = states[ticket.status];
            const href = generatePath(routePaths.ticket, { ticketId: ticket.id });
            return (
              <tr key={ticket.id} className={ticket.status === 'void' ? 'tr-void-row' : undefined}>
                <td className="tr-figure tr-row-head">
                  <Link to={href} aria-label={`Ticket ${ticket.number}`}>
                    {ticket.number}
                  </Link>
                </td>
                <td className="tr-nowrap">{branchTimeText(ticket.openedAt, timeZone)}</td>
                <td>
                  <Link to={href}>{ticket.clientName ?? 'Walk-in'}</Link>
                </td>
                <td>{ticket.staffNames.length > 0 ? ticket.staffNames.join(', ') : <span className="tr-muted">—</span>}</td>
                <td className="tr-figure">{ticket.services}</td>
                <td className="tr-figure">{ticket.total}</td>
                <td className="tr-figure">{ticket.paid}</td>
                <td className="tr-figure">{ticket.due}</td>
                <td className="tr-nowrap">
                  <Tag minimal={ticket.status !== 'closed'} intent={state.intent}>
                    {state.text}
                  </Tag>
                  {ticket.locked && (
                    <span className="tr-locked-mark" title="Its day is closed">
                      <LockIcon aria-label="Locked" />
                    </span>
                  )}
                </td>
                <td className="tr-nowrap">
                  {ticket.colourLinesWithoutBowl > 0 && ticket.status === 'open' ? (
                    <Tag minimal intent={Intent.WARNING} icon={<TintIcon />}>
                      {ticket.colourLinesWithoutBowl === 1 ? 'Bowl to record' : `${ticket.colourLinesWithoutBowl} bowls to record`}
                    </Tag>
                  ) : null}
                </td>
              </tr>
            );
          })}
        </tbody>
        <tfoot>
          <tr>
            <th scope="row" colSpan={4}>
              {counted.length === 1 ? '1 ticket' : `${counted.length} tickets`}
              {tickets.length > counted.length ? `, and ${tickets.length - counted.length} void` : ''}
            </th>
            <td className="tr-figure">{sum((t) => t.services)}</td>
            <td className="tr-figure">{sum((t) => t.total)}</td>
            <td className="tr-figure">{sum((t) => t.paid)}</td>
            <td className="tr-figure">{sum((t) => t.due)}</td>
            <td colSpan={2} />
          </tr>
        </tfoot>
      </HTMLTable>
    </div>
  );
}
