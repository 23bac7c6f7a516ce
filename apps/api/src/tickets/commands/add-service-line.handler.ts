import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { DomainError, serviceLinePrice } from '@tressury/domain';
import type { TicketView } from '../dto/ticket.view.js';
import { ServiceLineAdded } from '../events/ticket-events.js';
import { colourNeedsPatchTestAcknowledgement, TicketEditing } from '../ticket-editing.js';
import { invalidReference, stylistOwnWorkOnly } from '../ticket-errors.js';
import { TicketReferences } from '../ticket-references.js';
import { TicketsRepository } from '../tickets.repository.js';
import { AddServiceLineCommand } from './add-service-line.command.js';

export const patchTestCaution = (hasClient: boolean, lastPatchTestOn: string | null) =>
  new DomainError(
    'ticket.patch_test_caution',
    `${!hasClient ? 'A walk-in has no client record, so no patch test is on record' : lastPatchTestOn ? `This client's last patch test (${lastPatchTestOn}) is not current for colour today` : 'This client has no patch test on record'}. ` +
      'Common practice is a skin test 48 hours before colour; licensed practice and local codes govern. Confirm to go ahead.',
    'conflict',
    'acknowledgePatchTest',
  );

@CommandHandler(AddServiceLineCommand)
export class AddServiceLineHandler implements ICommandHandler<AddServiceLineCommand> {
  constructor(
    private readonly editing: TicketEditing,
    private readonly tickets: TicketsRepository,
    private readonly references: TicketReferences,
  ) {}

  execute({ user, ticketId, input }: AddServiceLineCommand): Promise<TicketView> {
    return this.editing.edit(user, ticketId, 'update', async (loaded) => {
      if (user.role === 'stylist' && input.staffId !== user.staffId) throw stylistOwnWorkOnly();
      const service = await this.references.service(user.organisationId, input.serviceId);
      if (!service?.active) throw invalidReference('serviceId', 'No such service on the menu.');
      const stylist = await this.references.staffMember(user.organisationId, input.staffId);
      if (!stylist?.active) throw invalidReference('staffId', 'No such staff member, or no longer active.');
      const listPrice = await this.references.price(service.id, stylist.levelId);
      if (listPrice === null) throw invalidReference('staffId', `${service.name} has no price at ${stylist.displayName}'s level.`);
      if (input.assistantStaffId) {
        const assistant = await this.references.staffMember(user.organisationId, input.assistantStaffId);
        if (!assistant?.active) throw invalidReference('assistantStaffId', 'No such staff member, or no longer active.');
        if (assistant.id === stylist.id) throw invalidReference('assistantStaffId', 'The assistant must be someone other than the stylist.');
        if (input.assistantShare === undefined) throw invalidReference('assistantShare', "Give the assistant's share of the line, e.g. 0.25.");
      } else if (input.assistantShare !== undefined) {
        throw invalidReference('assistantShare', 'A share needs an assistant.');
      }
      if (service.isColour && !loaded.ticket.patchTestAcknowledgedAt && colourNeedsPatchTestAcknowledgement(loaded)) {
        if (!input.acknowledgePatchTest) throw patchTestCaution(loaded.client !== null, loaded.client?.lastPatchTestOn ?? null);
        await this.tickets.updateTicket(loaded.ticket.id, { patchTestAcknowledgedById: user.id, patchTestAcknowledgedAt: new Date() });
      }
      const discount = input.discount ?? '0';
      const line = await this.tickets.insertServiceLine({
        ticketId: loaded.ticket.id,
        serviceId: service.id,
        serviceName: service.name,
        isColour: service.isColour,
        staffId: stylist.id,
        levelId: stylist.levelId,
        assistantStaffId: input.assistantStaffId ?? null,
        assistantShare: input.assistantShare ?? null,
        listPrice,
        discount,
        price: serviceLinePrice({ listPrice, discount }),
        bookedOn: loaded.ticket.businessDate,
      });
      return new ServiceLineAdded(user.organisationId, loaded.ticket.id, user.id, { after: line });
    });
  }
}
