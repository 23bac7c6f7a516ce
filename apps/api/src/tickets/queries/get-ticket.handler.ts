import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { type TicketView, toTicketView } from '../dto/ticket.view.js';
import { patchTestNeeded } from '../ticket-editing.js';
import { ticketNotFound } from '../ticket-errors.js';
import { TicketsRepository } from '../tickets.repository.js';
import { GetTicketQuery } from './get-ticket.query.js';

@QueryHandler(GetTicketQuery)
export class GetTicketHandler implements IQueryHandler<GetTicketQuery> {
  constructor(
    private readonly tickets: TicketsRepository,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, ticketId }: GetTicketQuery): Promise<TicketView> {
    const loaded = await this.tickets.load(user.organisationId, ticketId);
    if (!loaded) throw ticketNotFound();
    assertCan(this.abilities.createFor(user), user.role, 'read', 'Ticket', { ...loaded.ticket, staffIds: loaded.staffIds }, ticketNotFound);
    return toTicketView(loaded, patchTestNeeded(loaded));
  }
}
