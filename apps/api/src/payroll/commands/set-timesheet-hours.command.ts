import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { SetTimesheetHoursDto } from '../dto/set-timesheet-hours.dto.js';
import type { TimesheetEntryView } from '../dto/timesheet-entry.view.js';

export class SetTimesheetHoursCommand extends Command<TimesheetEntryView> {
  constructor(
    readonly user: AuthUser,
    readonly input: SetTimesheetHoursDto,
  ) {
    super();
  }
}
