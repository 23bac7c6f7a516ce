import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { timesheetEntries } from '@tressury/schema';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { accessibleBy } from '../../authz/accessible-by.js';
import { type TimesheetEntryView, toTimesheetEntryView } from '../dto/timesheet-entry.view.js';
import { PayCalendarRepository } from '../pay-calendar.repository.js';
import { payPeriodNotFound } from '../payroll-errors.js';
import { TimesheetsRepository } from '../timesheets.repository.js';
import { ListTimesheetEntriesQuery } from './list-timesheet-entries.query.js';

@QueryHandler(ListTimesheetEntriesQuery)
export class ListTimesheetEntriesHandler implements IQueryHandler<ListTimesheetEntriesQuery> {
  constructor(
    private readonly timesheets: TimesheetsRepository,
    private readonly calendar: PayCalendarRepository,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, periodId }: ListTimesheetEntriesQuery): Promise<TimesheetEntryView[]> {
    const period = await this.calendar.findPeriod(user.organisationId, periodId);
    if (!period) throw payPeriodNotFound();
    const readable = accessibleBy(this.abilities.createFor(user), 'read', 'Timesheet', {
      organisationId: timesheetEntries.organisationId,
      branchId: timesheetEntries.branchId,
      staffId: timesheetEntries.staffId,
    });
    const rows = await this.timesheets.listInRange(user.organisationId, period.startDate, period.endDate, readable);
    return rows.map(toTimesheetEntryView);
  }
}
