import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { UploadedSpreadsheet } from '../../common/spreadsheet-reader.js';
import type { TimesheetImportView } from '../dto/timesheet-import.view.js';

export class ImportTimesheetCommand extends Command<TimesheetImportView> {
  constructor(
    readonly user: AuthUser,
    readonly periodId: string,
    readonly file: UploadedSpreadsheet | undefined,
    readonly commit: boolean,
  ) {
    super();
  }
}
