import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import type { TicketView } from '../dto/ticket.view.js';
import { TipRemoved } from '../events/ticket-events.js';
import { TicketEditing } from '../ticket-editing.js';
import { notOnTicket, stylistOwnWorkOnly } from '../ticket-errors.js';
import { TicketsRepository } from '../tickets.repository.js';
import { RemoveTipCommand } from './remove-tip.command.js';

@CommandHandler(RemoveTipCommand)
export class RemoveTipHandler implements ICommandHandler<RemoveTipCommand> {
  constructor(
    private readonly editing: TicketEditing,
    private readonly tickets: TicketsRepository,
  ) {}

  execute({ user, ticketId, tipId }: RemoveTipCommand): Promise<TicketView> {
    return this.editing.edit(user, ticketId, 'update', async (loaded) => {
      if (user.role === 'stylist') throw stylistOwnWorkOnly();
      const tip = loaded.tips.find((t) => t.id === tipId);
      if (!tip) throw notOnTicket('tip', 'tipId');
      await this.tickets.deleteTip(tip.id);
      return new TipRemoved(user.organisationId, loaded.ticket.id, user.id, { before: tip });
    });
  }
}
