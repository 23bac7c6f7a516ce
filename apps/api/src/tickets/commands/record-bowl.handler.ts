import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { bowlPartOfProductKind, costBowl, isBowlProductKind, toRecordedGrams } from '@tressury/domain';
import type { TicketView } from '../dto/ticket.view.js';
import { BowlRecorded } from '../events/ticket-events.js';
import { TicketEditing } from '../ticket-editing.js';
import { invalidReference, notOnTicket, stylistOwnWorkOnly } from '../ticket-errors.js';
import { TicketReferences } from '../ticket-references.js';
import { TicketsRepository } from '../tickets.repository.js';
import { RecordBowlCommand } from './record-bowl.command.js';

@CommandHandler(RecordBowlCommand)
export class RecordBowlHandler implements ICommandHandler<RecordBowlCommand> {
  constructor(
    private readonly editing: TicketEditing,
    private readonly tickets: TicketsRepository,
    private readonly references: TicketReferences,
  ) {}

  execute({ user, ticketId, input }: RecordBowlCommand): Promise<TicketView> {
    return this.editing.edit(user, ticketId, 'update', async (loaded) => {
      const line = loaded.serviceLines.find((l) => l.id === input.serviceLineId && l.refundOfLineId === null);
      if (!line) throw notOnTicket('service_line', 'serviceLineId');
      if (!line.isColour) throw invalidReference('serviceLineId', `${line.serviceName} is not a colour service; bowls go on colour services.`);
      if (user.role === 'stylist' && line.staffId !== user.staffId && line.assistantStaffId !== user.staffId) throw stylistOwnWorkOnly();
      const mixedByStaffId = input.mixedByStaffId ?? line.staffId;
      if (input.mixedByStaffId && !(await this.references.staffMember(user.organisationId, input.mixedByStaffId))) {
        throw invalidReference('mixedByStaffId', 'No such staff member.');
      }

      const components = [];
      for (const [i, component] of input.components.entries()) {
        const product = await this.references.product(user.organisationId, component.productId);
        if (!product?.active || !isBowlProductKind(product.kind)) throw invalidReference(`components[${i}].productId`, 'No such colour, lightener, developer or treatment product.');
        components.push({
          productId: product.id,
          productName: product.name,
          kind: bowlPartOfProductKind[product.kind],
          grams: toRecordedGrams(component.amount, component.unit),
          costPerGram: product.costPerGram,
          developerVolume: product.kind === 'developer' ? product.developerVolume : null,
        });
      }
      const figures = costBowl({
        components: components.map((c) => ({ productId: c.productId, kind: c.kind, grams: c.grams, costPerGram: c.costPerGram, volume: c.developerVolume ?? undefined })),
        leftoverGrams: input.leftoverGrams ?? '0',
      });
      const bowl = await this.tickets.insertBowl(
        {
          serviceLineId: line.id,
          mixedByStaffId,
          leftoverGrams: input.leftoverGrams ?? '0',
          processingMinutes: input.processingMinutes ?? null,
          note: input.note ?? '',
          totalGrams: figures.totalGrams,
          ratio: figures.ratio,
          developerVolume: figures.developerVolume,
          cost: figures.cost,
          wasteGrams: figures.wasteGrams,
          wasteCost: figures.wasteCost,
        },
        components.map((c, position) => ({ ...c, position })),
      );
      return new BowlRecorded(user.organisationId, loaded.ticket.id, user.id, { serviceLineId: line.id, bowlId: bowl.id, components, figures });
    });
  }
}
