import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan, refusal } from '../../authz/refusal.js';
import { ValidationFailedError } from '../../common/validation-failed.error.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { type StaffView, toStaffView } from '../dto/staff.view.js';
import { StaffUpdated } from '../events/staff-updated.js';
import { staffNotFound } from '../staff-errors.js';
import { canOnPay } from '../staff-pay.js';
import { checkStaffReferences } from '../staff-references.js';
import { StaffRepository } from '../staff.repository.js';
import { UpdateStaffCommand } from './update-staff.command.js';

const CLEARABLE = ['email', 'userId', 'hourlyRate'];

@CommandHandler(UpdateStaffCommand)
export class UpdateStaffHandler implements ICommandHandler<UpdateStaffCommand> {
  constructor(
    private readonly database: Database,
    private readonly staff: StaffRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, staffId, changes }: UpdateStaffCommand): Promise<StaffView> {
    const ability = this.abilities.createFor(user);
    const sent = Object.fromEntries(Object.entries(changes).filter(([, value]) => value !== undefined)) as typeof changes;
    // PartialType lets null through every optional field; only these may be cleared.
    const nulls = Object.keys(sent).filter((field) => sent[field as keyof typeof sent] === null && !CLEARABLE.includes(field));
    if (nulls.length > 0) throw new ValidationFailedError(nulls.map((field) => ({ field, message: `${field} cannot be cleared; send a value or leave it out` })));
    return this.database.transaction(async () => {
      const current = await this.staff.findInOrganisation(user.organisationId, staffId);
      if (!current) throw staffNotFound();
      assertCan(ability, user.role, 'update', 'Staff', current, staffNotFound);
      if (Object.keys(sent).length === 0) return toStaffView(await this.staff.viewRow(staffId), canOnPay(ability, 'read', current));
      if ('hourlyRate' in sent && !canOnPay(ability, 'update', current)) throw refusal(user.role, 'update', 'StaffPay');
      const homeBranchId = sent.homeBranchId ?? current.homeBranchId;
      await checkStaffReferences(this.staff, ability, user, 'update', {
        staffId,
        homeBranchId,
        levelId: sent.levelId,
        userId: sent.userId,
      });
      const before = await this.staff.viewRow(staffId);
      const { userId, ...fields } = sent;
      if (Object.keys(fields).length > 0) await this.staff.update(staffId, fields);
      if (userId !== undefined) await this.staff.linkUser(staffId, userId);
      const after = await this.staff.viewRow(staffId);
      await this.events.append(new StaffUpdated(user.organisationId, staffId, user.id, toStaffView(before, true), toStaffView(after, true)));
      return toStaffView(after, canOnPay(ability, 'read', after));
    });
  }
}
