import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import type { TicketView } from '../dto/ticket.view.js';
import { ServiceLineRemoved } from '../events/ticket-events.js';
import { TicketEditing } from '../ticket-editing.js';
import { notOnTicket, stylistOwnWorkOnly } from '../ticket-errors.js';
import { TicketsRepository } from '../tickets.repository.js';
import { RemoveServiceLineCommand } from './remove-service-line.command.js';

@CommandHandler(RemoveServiceLineCommand)
export class RemoveServiceLineHandler implements ICommandHandler<RemoveServiceLineCommand> {
  constructor(
    private readonly editing: TicketEditing,
    private readonly tickets: TicketsRepository,
  ) {}

  execute({ user, ticketId, lineId }: RemoveServiceLineCommand): Promise<TicketView> {
    return this.editing.edit(user, ticketId, 'update', async (loaded) => {
      if (user.role === 'stylist') throw stylistOwnWorkOnly();
      const line = loaded.serviceLines.find((l) => l.id === lineId && l.refundOfLineId === null);
      if (!line) throw notOnTicket('service_line', 'lineId');
      await this.tickets.deleteServiceLine(line.id);
      return new ServiceLineRemoved(user.organisationId, loaded.ticket.id, user.id, { before: line });
    });
  }
}
