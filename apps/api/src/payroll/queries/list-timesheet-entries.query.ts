import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { TimesheetEntryView } from '../dto/timesheet-entry.view.js';

export class ListTimesheetEntriesQuery extends Query<TimesheetEntryView[]> {
  constructor(
    readonly user: AuthUser,
    readonly periodId: string,
  ) {
    super();
  }
}
