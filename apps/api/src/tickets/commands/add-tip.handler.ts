import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import type { TicketView } from '../dto/ticket.view.js';
import { TipAdded } from '../events/ticket-events.js';
import { TicketEditing } from '../ticket-editing.js';
import { invalidReference, stylistOwnWorkOnly } from '../ticket-errors.js';
import { TicketReferences } from '../ticket-references.js';
import { TicketsRepository } from '../tickets.repository.js';
import { AddTipCommand } from './add-tip.command.js';

@CommandHandler(AddTipCommand)
export class AddTipHandler implements ICommandHandler<AddTipCommand> {
  constructor(
    private readonly editing: TicketEditing,
    private readonly tickets: TicketsRepository,
    private readonly references: TicketReferences,
  ) {}

  execute({ user, ticketId, input }: AddTipCommand): Promise<TicketView> {
    return this.editing.edit(user, ticketId, 'update', async (loaded) => {
      // The client leaves tips at checkout, through the desk.
      if (user.role === 'stylist') throw stylistOwnWorkOnly();
      const member = await this.references.staffMember(user.organisationId, input.staffId);
      if (!member) throw invalidReference('staffId', 'No such staff member.');
      const tip = await this.tickets.insertTip({ ticketId: loaded.ticket.id, staffId: member.id, amount: input.amount, bookedOn: loaded.ticket.businessDate });
      return new TipAdded(user.organisationId, loaded.ticket.id, user.id, { after: tip });
    });
  }
}
