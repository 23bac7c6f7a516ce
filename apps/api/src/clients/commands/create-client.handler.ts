import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { accessibleBy } from '../../authz/accessible-by.js';
import { assertCan, refusal } from '../../authz/refusal.js';
import { businessDateIn } from '../../common/business-date.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { clientBranchUnknown, patchTestInFuture } from '../client-errors.js';
import { branchColumns } from '../clients.policies.js';
import { ClientsRepository } from '../clients.repository.js';
import { type ClientDetailView, toClientDetailView, toClientView } from '../dto/client.view.js';
import { ClientCreated } from '../events/client-created.js';
import { CreateClientCommand } from './create-client.command.js';

@CommandHandler(CreateClientCommand)
export class CreateClientHandler implements ICommandHandler<CreateClientCommand> {
  constructor(
    private readonly database: Database,
    private readonly clients: ClientsRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, input }: CreateClientCommand): Promise<ClientDetailView> {
    const ability = this.abilities.createFor(user);
    if (!ability.can('create', 'Client')) throw refusal(user.role, 'create', 'Client');
    return this.database.transaction(async () => {
      const branch = await this.clients.findBranch(user.organisationId, input.homeBranchId, accessibleBy(ability, 'read', 'Branch', branchColumns));
      if (!branch) throw clientBranchUnknown();
      const scope = { organisationId: user.organisationId, homeBranchId: branch.id, servedByStaffIds: [] };
      assertCan(ability, user.role, 'create', 'Client', scope, clientBranchUnknown);
      const today = businessDateIn(branch.timeZone);
      const lastPatchTestOn = input.lastPatchTestOn ?? null;
      if (lastPatchTestOn !== null && lastPatchTestOn > today) throw patchTestInFuture(lastPatchTestOn, today);
      const row = await this.clients.insert({
        organisationId: user.organisationId,
        homeBranchId: branch.id,
        firstName: input.firstName,
        lastName: input.lastName,
        phone: input.phone ?? null,
        email: input.email ?? null,
        notes: input.notes ?? '',
        allergyNotes: input.allergyNotes ?? '',
        lastPatchTestOn,
      });
      await this.events.append(new ClientCreated(user.organisationId, row.id, user.id, toClientView(row, branch.name)));
      return toClientDetailView(row, branch, today);
    });
  }
}
