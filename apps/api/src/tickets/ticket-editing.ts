import { Injectable } from '@nestjs/common';
import { patchTestStatus } from '@tressury/domain';
import type { TicketStatus } from '@tressury/schema';
import type { AuthUser } from '../auth/auth-user.js';
import type { Action } from '../authz/ability.js';
import { AbilityFactory } from '../authz/ability.factory.js';
import { assertCan } from '../authz/refusal.js';
import { Database } from '../database/database.js';
import { EventLog } from '../events/event-log.js';
import type { RecordableEvent } from '../events/recordable-event.js';
import { type TicketView, toTicketView } from './dto/ticket.view.js';
import { dayLocked, ticketNotFound, ticketNotOpen } from './ticket-errors.js';
import { type LoadedTicket, TicketsRepository } from './tickets.repository.js';

export type EditOptions = {
  /** Statuses the change applies to; only open tickets by default. */
  statuses?: TicketStatus[];
  /** A refund is booked on a later open day, so the ticket's own closed day does not stop it. */
  allowLockedDay?: boolean;
};

/** True when colour is on the ticket and the client has no current patch test for its date (common practice). */
export function patchTestNeeded(loaded: LoadedTicket): boolean {
  return loaded.serviceLines.some((line) => line.isColour && line.refundOfLineId === null) && colourNeedsPatchTestAcknowledgement(loaded);
}

/** Whether colour on this ticket's date needs the desk to confirm it may go ahead without a current patch test. */
export function colourNeedsPatchTestAcknowledgement(loaded: LoadedTicket): boolean {
  const status = patchTestStatus({
    lastPatchTestOn: loaded.client?.lastPatchTestOn ?? null,
    onDate: loaded.ticket.businessDate,
    maxAgeDays: loaded.branch.patchTestMaxAgeDays,
  }).status;
  return status !== 'current';
}

/**
 * The shape every ticket command shares, in one transaction: load and lock the ticket, check the
 * caller may do `action` on it (404 outside their scope, 403 otherwise), check the day is not closed
 * and the status fits, apply the change, append its event, and answer with the fresh ticket.
 */
@Injectable()
export class TicketEditing {
  constructor(
    private readonly database: Database,
    private readonly tickets: TicketsRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  edit(
    user: AuthUser,
    ticketId: string,
    action: Action,
    change: (loaded: LoadedTicket) => Promise<RecordableEvent>,
    options: EditOptions = {},
  ): Promise<TicketView> {
    return this.database.transaction(async () => {
      const loaded = await this.check(user, ticketId, action, options);
      await this.events.append(await change(loaded));
      return this.view(user.organisationId, ticketId);
    });
  }

  /** Loads and locks the ticket and runs the checks of `edit`; for commands that need more than one transaction. */
  async check(user: AuthUser, ticketId: string, action: Action, options: EditOptions = {}): Promise<LoadedTicket> {
    if (!this.database.inTransaction) throw new Error('TicketEditing.check must run inside a transaction');
    const loaded = await this.tickets.load(user.organisationId, ticketId, { forUpdate: true });
    if (!loaded) throw ticketNotFound();
    assertCan(this.abilities.createFor(user), user.role, action, 'Ticket', { ...loaded.ticket, staffIds: loaded.staffIds }, ticketNotFound);
    if (loaded.dayClosed && !options.allowLockedDay) throw dayLocked(loaded.ticket.businessDate);
    if (!(options.statuses ?? ['open']).includes(loaded.ticket.status)) throw ticketNotOpen(loaded.ticket);
    return loaded;
  }

  async view(organisationId: string, ticketId: string): Promise<TicketView> {
    const loaded = await this.tickets.load(organisationId, ticketId);
    if (!loaded) throw ticketNotFound();
    return toTicketView(loaded, patchTestNeeded(loaded));
  }
}
