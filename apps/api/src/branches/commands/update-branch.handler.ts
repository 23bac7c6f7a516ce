import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { branchNameTaken, branchNotFound } from '../branch-errors.js';
import { BranchesRepository } from '../branches.repository.js';
import { type BranchView, toBranchView } from '../dto/branch.view.js';
import { BranchUpdated } from '../events/branch-updated.js';
import { UpdateBranchCommand } from './update-branch.command.js';

@CommandHandler(UpdateBranchCommand)
export class UpdateBranchHandler implements ICommandHandler<UpdateBranchCommand> {
  constructor(
    private readonly database: Database,
    private readonly branches: BranchesRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, branchId, changes }: UpdateBranchCommand): Promise<BranchView> {
    const ability = this.abilities.createFor(user);
    return this.database.transaction(async () => {
      const current = await this.branches.findInOrganisation(user.organisationId, branchId);
      if (!current) throw branchNotFound();
      assertCan(ability, user.role, 'update', 'Branch', current, branchNotFound);
      if (changes.name !== undefined && (await this.branches.nameTaken(user.organisationId, changes.name, branchId))) {
        throw branchNameTaken(changes.name);
      }
      const before = toBranchView(current);
      const after = toBranchView(await this.branches.update(branchId, changes));
      await this.events.append(new BranchUpdated(user.organisationId, branchId, user.id, before, after));
      return after;
    });
  }
}
