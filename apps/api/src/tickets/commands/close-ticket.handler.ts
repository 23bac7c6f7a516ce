import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { DomainError, ticketTotals } from '@tressury/domain';
import type { TicketView } from '../dto/ticket.view.js';
import { TicketClosed } from '../events/ticket-events.js';
import { TicketEditing } from '../ticket-editing.js';
import { TicketsRepository } from '../tickets.repository.js';
import { CloseTicketCommand } from './close-ticket.command.js';

const cannotClose = (code: string, message: string) => new DomainError(`ticket.${code}`, message, 'conflict');

@CommandHandler(CloseTicketCommand)
export class CloseTicketHandler implements ICommandHandler<CloseTicketCommand> {
  constructor(
    private readonly editing: TicketEditing,
    private readonly tickets: TicketsRepository,
  ) {}

  execute({ user, ticketId }: CloseTicketCommand): Promise<TicketView> {
    return this.editing.edit(user, ticketId, 'close', async (loaded) => {
      if (loaded.serviceLines.length === 0 && loaded.retailLines.length === 0) {
        throw cannotClose('empty', 'There is nothing on this ticket to close; void it instead.');
      }
      const withoutProduct = loaded.serviceLines.filter((l) => l.isColour && l.bowls.length === 0 && !l.noProductReason);
      if (withoutProduct.length > 0) {
        throw cannotClose(
          'bowls_missing',
          `Record the bowls for ${withoutProduct.map((l) => l.serviceName).join(', ')}, or say why no product was used.`,
        );
      }
      if (loaded.payments.some((p) => p.status === 'pending')) {
        throw cannotClose('payment_pending', 'A card payment is still waiting for the card processor; close once it has settled.');
      }
      const totals = ticketTotals(loaded);
      if (totals.due !== '0.00') {
        throw cannotClose(
          totals.due.startsWith('-') ? 'overpaid' : 'unpaid',
          totals.due.startsWith('-') ? `More was paid than owed (${totals.due.slice(1)} over); refund the difference first.` : `${totals.due} is still due.`,
        );
      }
      await this.tickets.updateTicket(loaded.ticket.id, { status: 'closed', closedAt: new Date(), closedById: user.id });
      return new TicketClosed(user.organisationId, loaded.ticket.id, user.id, { totals });
    });
  }
}
