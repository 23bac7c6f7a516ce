import { Body, Controller, Get, HttpCode, Param, Post, Put, Query, UploadedFile, UseInterceptors } from '@nestjs/common';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiOperation, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { CheckPolicies } from '../authz/check-policies.decorator.js';
import { ParseId } from '../common/parse-id.pipe.js';
import { SPREADSHEET_MAX_ROWS, type UploadedSpreadsheet } from '../common/spreadsheet-reader.js';
import { ImportTimesheetCommand } from './commands/import-timesheet.command.js';
import { SetTimesheetHoursCommand } from './commands/set-timesheet-hours.command.js';
import { ImportOptionsDto } from './dto/import-options.dto.js';
import { SetTimesheetHoursDto } from './dto/set-timesheet-hours.dto.js';
import { TimesheetEntryView } from './dto/timesheet-entry.view.js';
import { TimesheetImportView } from './dto/timesheet-import.view.js';
import { ListTimesheetEntriesQuery } from './queries/list-timesheet-entries.query.js';
import { SpreadsheetUploadInterceptor } from '../common/spreadsheet-upload.interceptor.js';

@ApiTags('payroll')
@ApiBearerAuth()
@Controller('payroll')
export class TimesheetsController {
  constructor(
    private readonly commands: CommandBus,
    private readonly queries: QueryBus,
  ) {}

  /** Sets one staff member's hours for one day at one branch (owner; a manager for their branches). */
  @Put('timesheets')
  @CheckPolicies('update', 'Timesheet')
  setHours(@CurrentUser() user: AuthUser, @Body() body: SetTimesheetHoursDto): Promise<TimesheetEntryView> {
    return this.commands.execute(new SetTimesheetHoursCommand(user, body));
  }

  /** The hours entered in a pay period that the caller may see. */
  @Get('periods/:id/timesheets')
  @CheckPolicies('read', 'Timesheet')
  list(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string): Promise<TimesheetEntryView[]> {
    return this.queries.execute(new ListTimesheetEntriesQuery(user, id));
  }

  @Post('periods/:id/timesheets/import')
  @HttpCode(200)
  @CheckPolicies('update', 'Timesheet')
  @UseInterceptors(SpreadsheetUploadInterceptor)
  @ApiOperation({
    summary: 'Preview or commit a timesheet for the pay period',
    description: [
      'Headings: `staff_id`, `date` (YYYY-MM-DD, inside the period), `hours` (0 to 24, at most 3 decimals); optional `branch_id` (the staff member\'s home branch when left out). One row per staff member, branch and day.',
      `A .csv (UTF-8) or .xlsx file in the multipart field \`file\`, at most ${SPREADSHEET_MAX_ROWS} rows.`,
      'Without `commit=true` nothing is written and every row comes back with its errors. With `commit=true` all rows are written in one transaction, or, if any row is bad, nothing is and the answer is a 400 whose `details` name each row and column.',
    ].join('\n\n'),
  })
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', required: ['file'], properties: { file: { type: 'string', format: 'binary' } } } })
  import(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseId()) id: string,
    @UploadedFile() file: UploadedSpreadsheet | undefined,
    @Query() options: ImportOptionsDto,
  ): Promise<TimesheetImportView> {
    return this.commands.execute(new ImportTimesheetCommand(user, id, file, options.commit ?? false));
  }
}
