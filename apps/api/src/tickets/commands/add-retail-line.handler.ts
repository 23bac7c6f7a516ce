import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { retailLineAmounts } from '@tressury/domain';
import type { TicketView } from '../dto/ticket.view.js';
import { RetailLineAdded } from '../events/ticket-events.js';
import { TicketEditing } from '../ticket-editing.js';
import { invalidReference, stylistOwnWorkOnly } from '../ticket-errors.js';
import { TicketReferences } from '../ticket-references.js';
import { TicketsRepository } from '../tickets.repository.js';
import { AddRetailLineCommand } from './add-retail-line.command.js';

@CommandHandler(AddRetailLineCommand)
export class AddRetailLineHandler implements ICommandHandler<AddRetailLineCommand> {
  constructor(
    private readonly editing: TicketEditing,
    private readonly tickets: TicketsRepository,
    private readonly references: TicketReferences,
  ) {}

  execute({ user, ticketId, input }: AddRetailLineCommand): Promise<TicketView> {
    return this.editing.edit(user, ticketId, 'update', async (loaded) => {
      if (user.role === 'stylist' && input.sellerStaffId !== user.staffId) throw stylistOwnWorkOnly();
      const product = await this.references.product(user.organisationId, input.productId);
      if (!product?.active || product.kind !== 'retail') throw invalidReference('productId', 'No such retail product.');
      const unitPrice = input.unitPrice ?? product.retailPrice;
      if (unitPrice === null) throw invalidReference('unitPrice', `${product.name} has no retail price; give one.`);
      const seller = await this.references.staffMember(user.organisationId, input.sellerStaffId);
      if (!seller?.active) throw invalidReference('sellerStaffId', 'No such staff member, or no longer active.');
      const taxRate = loaded.branch.retailTaxRate;
      const line = await this.tickets.insertRetailLine({
        ticketId: loaded.ticket.id,
        productId: product.id,
        productName: product.name,
        quantity: input.quantity,
        unitPrice,
        ...retailLineAmounts({ quantity: input.quantity, unitPrice, taxRate }),
        taxRate,
        sellerStaffId: seller.id,
        bookedOn: loaded.ticket.businessDate,
      });
      return new RetailLineAdded(user.organisationId, loaded.ticket.id, user.id, { after: line });
    });
  }
}
