import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { DomainError, roundMoney } from '@tressury/domain';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { businessDateIn } from '../../common/business-date.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { branchNotFound } from '../day-close-errors.js';
import { DayCloseRepository } from '../day-close.repository.js';
import type { AdjustmentView } from '../dto/day-preview.view.js';
import { AdjustmentAdded } from '../events/adjustment-added.js';
import { AddAdjustmentCommand } from './add-adjustment.command.js';

/** A correction to a locked day, booked on today's business date, which must still be open. */
@CommandHandler(AddAdjustmentCommand)
export class AddAdjustmentHandler implements ICommandHandler<AddAdjustmentCommand> {
  constructor(
    private readonly database: Database,
    private readonly closes: DayCloseRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, input }: AddAdjustmentCommand): Promise<AdjustmentView> {
    const amount = roundMoney(input.amount);
    if (amount === '0.00') throw new DomainError('adjustment.zero', 'An adjustment of 0 changes nothing.', 'invalid', 'amount');
    return this.database.transaction(async () => {
      const branch = await this.closes.branch(user.organisationId, input.branchId);
      if (!branch) throw branchNotFound();
      assertCan(this.abilities.createFor(user), user.role, 'create', 'DayClose', { organisationId: branch.organisationId, branchId: branch.id }, branchNotFound);
      const bookedOn = businessDateIn(branch.timeZone);
      await this.database.lockBranchDay(branch.id, bookedOn);
      if (await this.closes.find(branch.id, bookedOn)) {
        throw new DomainError('day.locked', `Today (${bookedOn}) is already closed at ${branch.name}; book the adjustment tomorrow.`, 'conflict');
      }
      if (input.ticketId) {
        const ticket = await this.closes.ticket(user.organisationId, input.ticketId);
        if (!ticket || ticket.branchId !== branch.id) throw new DomainError('adjustment.no_such_ticket', 'No such ticket at this branch.', 'invalid', 'ticketId');
        if (!(await this.closes.find(branch.id, ticket.businessDate))) {
          throw new DomainError('adjustment.ticket_day_open', `Ticket ${ticket.number}'s day is still open: change the ticket itself.`, 'invalid', 'ticketId');
        }
      }
      if (input.staffId) {
        if (!(await this.closes.staffExists(user.organisationId, input.staffId))) throw new DomainError('adjustment.no_such_staff', 'No such staff member.', 'invalid', 'staffId');
      }
      const row = await this.closes.insertAdjustment({
        organisationId: user.organisationId,
        branchId: branch.id,
        bookedOn,
        ticketId: input.ticketId ?? null,
        staffId: input.staffId ?? null,
        category: input.category,
        amount,
        reason: input.reason,
        createdById: user.id,
      });
      await this.events.append(new AdjustmentAdded(user.organisationId, row.id, user.id, { after: row }));
      return { id: row.id, category: row.category, amount: row.amount, reason: row.reason, ticketId: row.ticketId, staffId: row.staffId };
    });
  }
}
