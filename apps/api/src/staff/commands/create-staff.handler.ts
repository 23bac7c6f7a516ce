import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { refusal } from '../../authz/refusal.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { type StaffView, toStaffView } from '../dto/staff.view.js';
import { StaffCreated } from '../events/staff-created.js';
import { canOnPay } from '../staff-pay.js';
import { checkStaffReferences } from '../staff-references.js';
import { StaffRepository } from '../staff.repository.js';
import { CreateStaffCommand } from './create-staff.command.js';

@CommandHandler(CreateStaffCommand)
export class CreateStaffHandler implements ICommandHandler<CreateStaffCommand> {
  constructor(
    private readonly database: Database,
    private readonly staff: StaffRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, input }: CreateStaffCommand): Promise<StaffView> {
    const ability = this.abilities.createFor(user);
    if (!ability.can('create', 'Staff')) throw refusal(user.role, 'create', 'Staff');
    const hourlyRate = input.hourlyRate ?? null;
    // An hourly rate is a pay figure: setting one needs the right to change pay, not only staff records.
    const newcomer = { id: '', organisationId: user.organisationId, homeBranchId: input.homeBranchId };
    if (hourlyRate !== null && !canOnPay(ability, 'update', newcomer)) throw refusal(user.role, 'update', 'StaffPay');
    return this.database.transaction(async () => {
      await checkStaffReferences(this.staff, ability, user, 'create', {
        staffId: null,
        homeBranchId: input.homeBranchId,
        levelId: input.levelId,
        userId: input.userId ?? null,
      });
      const row = await this.staff.insert({
        organisationId: user.organisationId,
        homeBranchId: input.homeBranchId,
        displayName: input.displayName,
        email: input.email ?? null,
        levelId: input.levelId,
        hourlyRate,
      });
      if (input.userId) await this.staff.linkUser(row.id, input.userId);
      const stored = await this.staff.viewRow(row.id);
      await this.events.append(new StaffCreated(user.organisationId, row.id, user.id, toStaffView(stored, true)));
      return toStaffView(stored, canOnPay(ability, 'read', stored));
    });
  }
}
