import { H2 } from '@blueprintjs/core';
import { CircleIcon, TickCircleIcon } from '@blueprintjs/icons';
import type { ReactNode } from 'react';
import { generatePath, Link } from 'react-router';
import { routePaths } from '../../../lib/route-paths';
import type { DayPreview } from '../api/day-close-queries';

const ticketLink = (id: string, text: string) => <Link to={generatePath(routePaths.ticket, { ticketId: id })}>{text}</Link>;

/** What must be true before the day can be closed, each item ticked or not, in words as well as a mark. */
export function DayChecklist({ preview }: { preview: DayPreview }) {
  const { openTickets, colourLinesWithoutBowl, pendingCardPayments } = preview;
  return (
    <section className="tr-panel" aria-labelledby="day-checklist">
      <H2 id="day-checklist" className="tr-panel-title">
        Before closing
      </H2>
      <ol className="tr-checklist">
        <Item
          done={openTickets.length === 0}
          doneText="Every ticket is closed or voided."
          todoText={openTickets.length === 1 ? '1 ticket is still open.' : `${openTickets.length} tickets are still open.`}
        >
          {openTickets.map((t) => (
            <li key={t.id}>
              {ticketLink(t.id, `Ticket ${t.number}`)} · {t.clientName ?? 'Walk-in'} · <span className="tr-figure">{t.due}</span> due
            </li>
          ))}
        </Item>
        <Item
          done={colourLinesWithoutBowl.length === 0}
          doneText="Every colour service has its bowl, or a reason why no product was used."
          todoText={colourLinesWithoutBowl.length === 1 ? '1 colour service has no bowl recorded.' : `${colourLinesWithoutBowl.length} colour services have no bowl recorded.`}
        >
          {colourLinesWithoutBowl.map((line, index) => (
            <li key={`${line.ticketId}-${index}`}>
              {ticketLink(line.ticketId, `Ticket ${line.number}`)} · {line.serviceName} · {line.staffName}
            </li>
          ))}
        </Item>
        <Item
          done={pendingCardPayments === 0}
          doneText="No card payment is waiting for the card processor."
          todoText={
            pendingCardPayments === 1
              ? '1 card payment is still waiting for the card processor.'
              : `${pendingCardPayments} card payments are still waiting for the card processor.`
          }
        />
      </ol>
    </section>
  );
}

function Item({ done, doneText, todoText, children }: { done: boolean; doneText: string; todoText: string; children?: ReactNode }) {
  return (
    <li className={done ? 'tr-check-item tr-check-done' : 'tr-check-item tr-check-todo'}>
      <span className="tr-check-mark">{done ? <TickCircleIcon /> : <CircleIcon />}</span>
      <div>
        <span className="tr-check-state">{done ? 'Done' : 'To do'}</span> — {done ? doneText : todoText}
        {!done && children && <ul className="tr-check-details">{children}</ul>}
      </div>
    </li>
  );
}
