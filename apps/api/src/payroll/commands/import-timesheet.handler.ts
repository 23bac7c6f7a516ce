import { subject as asSubject } from '@casl/ability';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { DomainError } from '@tressury/domain';
import Big from 'big.js';
import { AbilityFactory } from '../../authz/ability.factory.js';
import { assertCan, refusal } from '../../authz/refusal.js';
import { readSpreadsheet } from '../../common/spreadsheet-reader.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import type { TimesheetImportRowView, TimesheetImportView } from '../dto/timesheet-import.view.js';
import { TimesheetImported } from '../events/timesheet-imported.js';
import { PayCalendarRepository } from '../pay-calendar.repository.js';
import { payPeriodNotFound, payrollRunFrozen } from '../payroll-errors.js';
import { type RowProblem, TimesheetRejectedError } from '../timesheet-rejected.error.js';
import { TimesheetsRepository } from '../timesheets.repository.js';
import { ImportTimesheetCommand } from './import-timesheet.command.js';

const REQUIRED = ['staff_id', 'date', 'hours'] as const;
const OPTIONAL = ['branch_id'] as const;
const HOURS = /^\d{1,2}(\.\d{1,3})?$/;
const DATE = /^\d{4}-\d{2}-\d{2}$/;

type GoodRow = { staffId: string; branchId: string; date: string; hours: string };

/** A timesheet for one pay period: one row per staff member, branch and day. Preview, or all rows in one transaction. */
@CommandHandler(ImportTimesheetCommand)
export class ImportTimesheetHandler implements ICommandHandler<ImportTimesheetCommand> {
  constructor(
    private readonly database: Database,
    private readonly timesheets: TimesheetsRepository,
    private readonly calendar: PayCalendarRepository,
    private readonly events: EventLog,
    private readonly abilities: AbilityFactory,
  ) {}

  async execute({ user, periodId, file, commit }: ImportTimesheetCommand): Promise<TimesheetImportView> {
    const ability = this.abilities.createFor(user);
    if (!ability.can('update', 'Timesheet')) throw refusal(user.role, 'update', 'Timesheet');
    const period = await this.calendar.findPeriod(user.organisationId, periodId);
    if (!period) throw payPeriodNotFound();
    const sheet = await readSpreadsheet(file);
    const headers = sheet.headers.map((h) => h.trim().toLowerCase().replaceAll(' ', '_'));
    const missing = REQUIRED.filter((h) => !headers.includes(h));
    if (missing.length > 0) {
      throw new DomainError('timesheet.import_file', `Row 1 must name the columns ${REQUIRED.join(', ')}; missing: ${missing.join(', ')}.`, 'invalid', 'file');
    }
    const known = new Set<string>([...REQUIRED, ...OPTIONAL]);
    const staffById = new Map((await this.timesheets.staffOf(user.organisationId)).map((s) => [s.id, s]));
    const branchIds = new Set((await this.timesheets.branchesOf(user.organisationId)).map((b) => b.id));

    const seen = new Map<string, number>();
    const good: GoodRow[] = [];
    const rows: TimesheetImportRowView[] = sheet.rows.map(({ row, cells }) => {
      const values = Object.fromEntries(headers.map((h, i) => [h, cells[i] ?? '']).filter(([h]) => known.has(h!)));
      const errors: { field: string; message: string }[] = [];
      const member = staffById.get(values.staff_id!);
      const branchId = values.branch_id || member?.homeBranchId || '';
      const subject = member && { organisationId: user.organisationId, branchId, staffId: member.id };
      if (!member || !ability.can('update', asSubject('Timesheet', { ...subject! }))) errors.push({ field: 'staff_id', message: `No staff member "${values.staff_id}" whose hours you may enter.` });
      else if (!branchIds.has(branchId)) errors.push({ field: 'branch_id', message: `No branch "${branchId}".` });
      const date = values.date!;
      if (!DATE.test(date) || Number.isNaN(Date.parse(`${date}T00:00:00Z`)) || new Date(`${date}T00:00:00Z`).toISOString().slice(0, 10) !== date) {
        errors.push({ field: 'date', message: `"${date}" is not a date written YYYY-MM-DD.` });
      } else if (date < period.startDate || date > period.endDate) {
        errors.push({ field: 'date', message: `${date} is outside the pay period ${period.startDate} to ${period.endDate}.` });
      }
      const hours = values.hours!;
      if (!HOURS.test(hours)) errors.push({ field: 'hours', message: `"${hours}" is not a number of hours from 0 to 24 (at most 3 decimals).` });
      else if (new Big(hours).gt(24)) errors.push({ field: 'hours', message: `${hours} hours is more than a day holds (24).` });
      if (errors.length === 0) {
        const key = `${member!.id}:${branchId}:${date}`;
        const first = seen.get(key);
        if (first !== undefined) errors.push({ field: 'date', message: `Row ${first} already gives this staff member's hours for ${date}.` });
        else {
          seen.set(key, row);
          good.push({ staffId: member!.id, branchId, date, hours: new Big(hours).toFixed(3) });
        }
      }
      return { row, values, errors };
    });
    const invalidRows = rows.filter((r) => r.errors.length > 0).length;
    const view: TimesheetImportView = { committed: false, rows, validRows: rows.length - invalidRows, invalidRows };
    if (!commit) return view;
    if (invalidRows > 0) {
      const problems: RowProblem[] = rows.flatMap((r) => r.errors.map((e) => ({ row: r.row, field: e.field, message: `Row ${r.row}, ${e.field}: ${e.message}` })));
      throw new TimesheetRejectedError(problems, rows.length);
    }
    return this.database.transaction(async () => {
      const run = (await this.calendar.runsOf([period.id])).get(period.id);
      if (run && (run.status === 'approved' || run.status === 'exported')) throw payrollRunFrozen(run.status);
      for (const entry of good) {
        const subject = { organisationId: user.organisationId, branchId: entry.branchId, staffId: entry.staffId };
        assertCan(ability, user.role, 'update', 'Timesheet', subject, payPeriodNotFound);
        await this.timesheets.upsert({ ...subject, workDate: entry.date, hours: entry.hours, updatedById: user.id });
      }
      await this.events.append(new TimesheetImported(user.organisationId, period.id, user.id, { fileName: sheet.fileName, rows: good }));
      return { ...view, committed: true };
    });
  }
}

