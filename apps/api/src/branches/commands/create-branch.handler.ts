import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { refusal } from '../../authz/refusal.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { branchNameTaken } from '../branch-errors.js';
import { BranchesRepository } from '../branches.repository.js';
import { type BranchView, toBranchView } from '../dto/branch.view.js';
import { BranchCreated } from '../events/branch-created.js';
import { CreateBranchCommand } from './create-branch.command.js';

@CommandHandler(CreateBranchCommand)
export class CreateBranchHandler implements ICommandHandler<CreateBranchCommand> {
  constructor(
    private readonly database: Database,
    private readonly branches: BranchesRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, input }: CreateBranchCommand): Promise<BranchView> {
    const ability = this.abilities.createFor(user);
    if (!ability.can('create', 'Branch')) throw refusal(user.role, 'create', 'Branch');
    return this.database.transaction(async () => {
      if (await this.branches.nameTaken(user.organisationId, input.name)) throw branchNameTaken(input.name);
      const row = await this.branches.insert({
        organisationId: user.organisationId,
        name: input.name,
        timeZone: input.timeZone,
        currency: input.currency ?? 'USD',
        minimumWage: input.minimumWage ?? '7.25',
        overtimeAfterHours: input.overtimeAfterHours ?? '40',
        overtimeMultiplier: input.overtimeMultiplier ?? '1.5',
        commissionExemption: input.commissionExemption ?? false,
        retailTaxRate: input.retailTaxRate ?? '0',
        varianceNoteThreshold: input.varianceNoteThreshold ?? '5.00',
        patchTestMaxAgeDays: input.patchTestMaxAgeDays ?? 180,
        royaltyRate: input.royaltyRate ?? '0',
        marketingFundRate: input.marketingFundRate ?? '0',
      });
      const view = toBranchView(row);
      await this.events.append(new BranchCreated(user.organisationId, row.id, user.id, view));
      return view;
    });
  }
}
