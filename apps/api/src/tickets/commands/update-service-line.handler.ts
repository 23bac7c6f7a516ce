import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { serviceLinePrice } from '@tressury/domain';
import type { TicketView } from '../dto/ticket.view.js';
import { ServiceLineChanged } from '../events/ticket-events.js';
import { TicketEditing } from '../ticket-editing.js';
import { invalidReference, notOnTicket, stylistOwnWorkOnly } from '../ticket-errors.js';
import { TicketReferences } from '../ticket-references.js';
import { TicketsRepository } from '../tickets.repository.js';
import { UpdateServiceLineCommand } from './update-service-line.command.js';

@CommandHandler(UpdateServiceLineCommand)
export class UpdateServiceLineHandler implements ICommandHandler<UpdateServiceLineCommand> {
  constructor(
    private readonly editing: TicketEditing,
    private readonly tickets: TicketsRepository,
    private readonly references: TicketReferences,
  ) {}

  execute({ user, ticketId, lineId, input }: UpdateServiceLineCommand): Promise<TicketView> {
    return this.editing.edit(user, ticketId, 'update', async (loaded) => {
      const line = loaded.serviceLines.find((l) => l.id === lineId && l.refundOfLineId === null);
      if (!line) throw notOnTicket('service_line', 'lineId');
      // A stylist records what they did (e.g. why no product was used); prices and people are the desk's.
      const onlyReason = Object.keys(input).every((key) => key === 'noProductReason');
      if (user.role === 'stylist' && (line.staffId !== user.staffId || !onlyReason)) throw stylistOwnWorkOnly();

      let levelId = line.levelId;
      let listPrice = line.listPrice;
      const staffId = input.staffId ?? line.staffId;
      if (input.staffId && input.staffId !== line.staffId) {
        const stylist = await this.references.staffMember(user.organisationId, input.staffId);
        if (!stylist?.active) throw invalidReference('staffId', 'No such staff member, or no longer active.');
        const price = await this.references.price(line.serviceId, stylist.levelId);
        if (price === null) throw invalidReference('staffId', `${line.serviceName} has no price at ${stylist.displayName}'s level.`);
        levelId = stylist.levelId;
        listPrice = price;
      }
      const assistantStaffId = input.assistantStaffId === undefined ? line.assistantStaffId : input.assistantStaffId;
      const assistantShare = input.assistantShare === undefined ? line.assistantShare : input.assistantShare;
      if (assistantStaffId) {
        const assistant = await this.references.staffMember(user.organisationId, assistantStaffId);
        if (!assistant?.active) throw invalidReference('assistantStaffId', 'No such staff member, or no longer active.');
        if (assistantStaffId === staffId) throw invalidReference('assistantStaffId', 'The assistant must be someone other than the stylist.');
        if (assistantShare === null) throw invalidReference('assistantShare', "Give the assistant's share of the line, e.g. 0.25.");
      } else if (assistantShare !== null && input.assistantShare !== undefined) {
        throw invalidReference('assistantShare', 'A share needs an assistant.');
      }
      const discount = input.discount ?? line.discount;
      const changes = {
        staffId,
        levelId,
        listPrice,
        discount,
        price: serviceLinePrice({ listPrice, discount }),
        assistantStaffId,
        assistantShare: assistantStaffId ? assistantShare : null,
        noProductReason: input.noProductReason === undefined ? line.noProductReason : input.noProductReason,
      };
      await this.tickets.updateServiceLine(line.id, changes);
      const { bowls: _bowls, ...before } = line;
      return new ServiceLineChanged(user.organisationId, loaded.ticket.id, user.id, { before, after: { ...before, ...changes } });
    });
  }
}
