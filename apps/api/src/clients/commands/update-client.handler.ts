import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { accessibleBy } from '../../authz/accessible-by.js';
import { assertCan } from '../../authz/refusal.js';
import { businessDateIn } from '../../common/business-date.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { clientBranchUnknown, clientNotFound, patchTestInFuture } from '../client-errors.js';
import { branchColumns } from '../clients.policies.js';
import { ClientsRepository } from '../clients.repository.js';
import { type ClientDetailView, toClientDetailView, toClientView } from '../dto/client.view.js';
import { ClientUpdated } from '../events/client-updated.js';
import { UpdateClientCommand } from './update-client.command.js';

@CommandHandler(UpdateClientCommand)
export class UpdateClientHandler implements ICommandHandler<UpdateClientCommand> {
  constructor(
    private readonly database: Database,
    private readonly clients: ClientsRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, clientId, changes }: UpdateClientCommand): Promise<ClientDetailView> {
    const ability = this.abilities.createFor(user);
    return this.database.transaction(async () => {
      const current = await this.clients.find(user.organisationId, clientId, { forUpdate: true });
      if (!current) throw clientNotFound();
      assertCan(ability, user.role, 'update', 'Client', current, clientNotFound);
      const currentBranch = (await this.clients.findBranch(user.organisationId, current.homeBranchId))!;
      let branch = currentBranch;
      if (changes.homeBranchId !== undefined && changes.homeBranchId !== current.homeBranchId) {
        const target = await this.clients.findBranch(user.organisationId, changes.homeBranchId, accessibleBy(ability, 'read', 'Branch', branchColumns));
        if (!target) throw clientBranchUnknown();
        assertCan(ability, user.role, 'update', 'Client', { ...current, homeBranchId: target.id }, clientBranchUnknown);
        branch = target;
      }
      const today = businessDateIn(branch.timeZone);
      if (changes.lastPatchTestOn && changes.lastPatchTestOn > today) throw patchTestInFuture(changes.lastPatchTestOn, today);
      // Fields left out stay undefined, and Drizzle leaves undefined columns alone.
      const { firstName, lastName, homeBranchId, phone, email, notes, allergyNotes, lastPatchTestOn } = changes;
      const row = await this.clients.update(clientId, { firstName, lastName, homeBranchId, phone, email, notes, allergyNotes, lastPatchTestOn });
      await this.events.append(
        new ClientUpdated(user.organisationId, clientId, user.id, toClientView(current, currentBranch.name), toClientView(row, branch.name)),
      );
      return toClientDetailView(row, branch, today);
    });
  }
}
