import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import type { TicketView } from '../dto/ticket.view.js';
import { RetailLineRemoved } from '../events/ticket-events.js';
import { TicketEditing } from '../ticket-editing.js';
import { notOnTicket, stylistOwnWorkOnly } from '../ticket-errors.js';
import { TicketsRepository } from '../tickets.repository.js';
import { RemoveRetailLineCommand } from './remove-retail-line.command.js';

@CommandHandler(RemoveRetailLineCommand)
export class RemoveRetailLineHandler implements ICommandHandler<RemoveRetailLineCommand> {
  constructor(
    private readonly editing: TicketEditing,
    private readonly tickets: TicketsRepository,
  ) {}

  execute({ user, ticketId, lineId }: RemoveRetailLineCommand): Promise<TicketView> {
    return this.editing.edit(user, ticketId, 'update', async (loaded) => {
      const line = loaded.retailLines.find((l) => l.id === lineId && l.refundOfLineId === null);
      if (!line) throw notOnTicket('retail_line', 'lineId');
      if (user.role === 'stylist' && line.sellerStaffId !== user.staffId) throw stylistOwnWorkOnly();
      await this.tickets.deleteRetailLine(line.id);
      return new RetailLineRemoved(user.organisationId, loaded.ticket.id, user.id, { before: line });
    });
  }
}
