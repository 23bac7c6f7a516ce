import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import Big from 'big.js';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan } from '../../authz/refusal.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { type TimesheetEntryView, toTimesheetEntryView } from '../dto/timesheet-entry.view.js';
import { TimesheetHoursSet } from '../events/timesheet-hours-set.js';
import { PayCalendarRepository } from '../pay-calendar.repository.js';
import { branchNotFound, periodFrozen, staffNotFound } from '../payroll-errors.js';
import { TimesheetsRepository } from '../timesheets.repository.js';
import { SetTimesheetHoursCommand } from './set-timesheet-hours.command.js';

@CommandHandler(SetTimesheetHoursCommand)
export class SetTimesheetHoursHandler implements ICommandHandler<SetTimesheetHoursCommand> {
  constructor(
    private readonly database: Database,
    private readonly timesheets: TimesheetsRepository,
    private readonly calendar: PayCalendarRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, input }: SetTimesheetHoursCommand): Promise<TimesheetEntryView> {
    const ability = this.abilities.createFor(user);
    return this.database.transaction(async () => {
      const member = (await this.timesheets.staffOf(user.organisationId)).find((s) => s.id === input.staffId);
      if (!member) throw staffNotFound();
      const branchId = input.branchId ?? member.homeBranchId;
      if (!(await this.timesheets.branchesOf(user.organisationId)).some((b) => b.id === branchId)) throw branchNotFound();
      const subject = { organisationId: user.organisationId, branchId, staffId: member.id };
      assertCan(ability, user.role, 'update', 'Timesheet', subject, () => staffNotFound());
      if (await this.calendar.frozenOn(user.organisationId, input.date)) throw periodFrozen(input.date);
      const before = await this.timesheets.find(member.id, branchId, input.date);
      const row = await this.timesheets.upsert({ ...subject, workDate: input.date, hours: new Big(input.hours).toFixed(3), updatedById: user.id });
      await this.events.append(
        new TimesheetHoursSet(user.organisationId, row.id, user.id, { staffId: member.id, branchId, date: input.date, before: before?.hours ?? null, after: row.hours }),
      );
      return toTimesheetEntryView({ ...row, staffName: member.displayName });
    });
  }
}
