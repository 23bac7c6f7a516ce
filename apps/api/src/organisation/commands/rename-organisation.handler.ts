import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { type OrganisationView, toOrganisationView } from '../dto/organisation.view.js';
import { OrganisationRenamed } from '../events/organisation-renamed.js';
import { organisationNotFound } from '../organisation-errors.js';
import { OrganisationRepository } from '../organisation.repository.js';
import { RenameOrganisationCommand } from './rename-organisation.command.js';

@CommandHandler(RenameOrganisationCommand)
export class RenameOrganisationHandler implements ICommandHandler<RenameOrganisationCommand> {
  constructor(
    private readonly database: Database,
    private readonly organisations: OrganisationRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, name }: RenameOrganisationCommand): Promise<OrganisationView> {
    const ability = this.abilities.createFor(user);
    return this.database.transaction(async () => {
      const current = await this.organisations.find(user.organisationId);
      if (!current) throw organisationNotFound();
      assertCan(ability, user.role, 'update', 'Organisation', current, organisationNotFound);
      const row = await this.organisations.rename(current.id, name);
      await this.events.append(new OrganisationRenamed(current.id, user.id, { name: current.name }, { name: row.name }));
      return toOrganisationView(row);
    });
  }
}
