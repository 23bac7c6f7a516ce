import { DomainError } from '@tressury/domain';
import type { TicketRow } from '@tressury/schema';

export const ticketNotFound = () => new DomainError('ticket.not_found', 'No such ticket.', 'not_found');

export const dayLocked = (businessDate: string) =>
  new DomainError(
    'day.locked',
    `The day ${businessDate} is closed, so its tickets are locked. Corrections go in as dated adjustments on a later open day.`,
    'conflict',
  );

export const ticketNotOpen = (ticket: TicketRow) =>
  new DomainError('ticket.not_open', `Ticket ${ticket.number} is ${ticket.status}; only an open ticket can be changed.`, 'conflict');

export const notOnTicket = (what: string, field: string) => new DomainError(`ticket.no_such_${what}`, `That ${what.replace('_', ' ')} is not on this ticket.`, 'invalid', field);

export const invalidReference = (field: string, message: string) => new DomainError('ticket.invalid_reference', message, 'invalid', field);

export const stylistOwnWorkOnly = () =>
  new DomainError(
    'ticket.stylist_own_work_only',
    'A stylist records bowls, retail and the no-product reason on their own services; prices, people and lines are for the front desk or a manager.',
    'forbidden',
  );
