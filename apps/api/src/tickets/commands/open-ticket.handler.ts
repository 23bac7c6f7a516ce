import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { DomainError } from '@tressury/domain';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { businessDateIn } from '../../common/business-date.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import type { TicketView } from '../dto/ticket.view.js';
import { TicketOpened } from '../events/ticket-events.js';
import { TicketEditing } from '../ticket-editing.js';
import { dayLocked, invalidReference } from '../ticket-errors.js';
import { TicketReferences } from '../ticket-references.js';
import { TicketsRepository } from '../tickets.repository.js';
import { OpenTicketCommand } from './open-ticket.command.js';

const branchNotFound = () => new DomainError('branch.not_found', 'No such branch.', 'not_found', 'branchId');

@CommandHandler(OpenTicketCommand)
export class OpenTicketHandler implements ICommandHandler<OpenTicketCommand> {
  constructor(
    private readonly database: Database,
    private readonly tickets: TicketsRepository,
    private readonly references: TicketReferences,
    private readonly editing: TicketEditing,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, input }: OpenTicketCommand): Promise<TicketView> {
    const ability = this.abilities.createFor(user);
    return this.database.transaction(async () => {
      const branch = await this.references.branch(user.organisationId, input.branchId);
      if (!branch) throw branchNotFound();
      assertCan(ability, user.role, 'create', 'Ticket', { organisationId: branch.organisationId, branchId: branch.id, staffIds: [] }, branchNotFound);
      if (input.clientId && !(await this.references.client(user.organisationId, input.clientId))) {
        throw invalidReference('clientId', 'No such client.');
      }
      const businessDate = businessDateIn(branch.timeZone);
      await this.database.lockBranchDay(branch.id, businessDate);
      if (await this.tickets.isDayClosed(branch.id, businessDate)) throw dayLocked(businessDate);
      const ticket = await this.tickets.insertTicket({
        organisationId: user.organisationId,
        branchId: branch.id,
        businessDate,
        number: await this.tickets.nextNumber(branch.id, businessDate),
        clientId: input.clientId ?? null,
        openedById: user.id,
      });
      await this.events.append(
        new TicketOpened(user.organisationId, ticket.id, user.id, { branchId: branch.id, businessDate, number: ticket.number, clientId: ticket.clientId }),
      );
      return this.editing.view(user.organisationId, ticket.id);
    });
  }
}
