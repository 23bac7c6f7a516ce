import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { DomainError, ticketTotals } from '@tressury/domain';
import type { TicketView } from '../dto/ticket.view.js';
import { TicketVoided } from '../events/ticket-events.js';
import { TicketEditing } from '../ticket-editing.js';
import { TicketsRepository } from '../tickets.repository.js';
import { VoidTicketCommand } from './void-ticket.command.js';

@CommandHandler(VoidTicketCommand)
export class VoidTicketHandler implements ICommandHandler<VoidTicketCommand> {
  constructor(
    private readonly editing: TicketEditing,
    private readonly tickets: TicketsRepository,
  ) {}

  execute({ user, ticketId, input }: VoidTicketCommand): Promise<TicketView> {
    return this.editing.edit(
      user,
      ticketId,
      'void',
      async (loaded) => {
        // Once money has been taken the ticket's history stays: a refund, not a void, undoes it.
        if (loaded.payments.some((p) => p.status !== 'failed')) {
          const { paid } = ticketTotals(loaded);
          throw new DomainError('ticket.paid', `Money has been taken on this ticket (${paid} net); refund it instead of voiding.`, 'conflict');
        }
        await this.tickets.updateTicket(loaded.ticket.id, { status: 'void', voidedAt: new Date(), voidedById: user.id, voidReason: input.reason });
        return new TicketVoided(user.organisationId, loaded.ticket.id, user.id, { reason: input.reason, previousStatus: loaded.ticket.status });
      },
      { statuses: ['open', 'closed'] },
    );
  }
}
