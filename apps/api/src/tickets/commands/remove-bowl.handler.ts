import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import type { TicketView } from '../dto/ticket.view.js';
import { BowlRemoved } from '../events/ticket-events.js';
import { TicketEditing } from '../ticket-editing.js';
import { notOnTicket, stylistOwnWorkOnly } from '../ticket-errors.js';
import { TicketsRepository } from '../tickets.repository.js';
import { RemoveBowlCommand } from './remove-bowl.command.js';

@CommandHandler(RemoveBowlCommand)
export class RemoveBowlHandler implements ICommandHandler<RemoveBowlCommand> {
  constructor(
    private readonly editing: TicketEditing,
    private readonly tickets: TicketsRepository,
  ) {}

  execute({ user, ticketId, bowlId }: RemoveBowlCommand): Promise<TicketView> {
    return this.editing.edit(user, ticketId, 'update', async (loaded) => {
      const line = loaded.serviceLines.find((l) => l.bowls.some((b) => b.id === bowlId));
      const bowl = line?.bowls.find((b) => b.id === bowlId);
      if (!line || !bowl) throw notOnTicket('bowl', 'bowlId');
      if (user.role === 'stylist' && line.staffId !== user.staffId && line.assistantStaffId !== user.staffId) throw stylistOwnWorkOnly();
      await this.tickets.deleteBowl(bowl.id);
      return new BowlRemoved(user.organisationId, loaded.ticket.id, user.id, { before: bowl });
    });
  }
}
